import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("changing one's own name through PATCH /api/me", () => {
  it("trims and saves a client user's new name, audits it, and the owner's activity log shows the real client account beside it", async () => {
    const client = await t.signIn(demo.client);
    const response = await client.patch("/api/me").send({ name: "  Mara Linden (Owner)  " });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ name: "Mara Linden (Owner)", role: "client", clientAccount: { name: "Lantern Static" } });
    expect((await client.get("/api/me")).body.name).toBe("Mara Linden (Owner)");

    const owner = await t.signIn(demo.owner);
    const log = await owner.get("/api/audit-events?entityType=user");
    const [event] = log.body;
    expect(event).toMatchObject({
      action: "profile.update",
      actorName: "Mara Linden (Owner)",
      actorClientAccountName: "Lantern Static",
      before: { name: expect.any(String) },
      after: { name: "Mara Linden (Owner)" },
    });
  });

  it("renames a member of staff everywhere staff names are shown", async () => {
    const engineer = await t.signIn(demo.engineer);
    expect((await engineer.patch("/api/me").send({ name: "Theo Vance-Okafor" })).status).toBe(200);
    const owner = await t.signIn(demo.owner);
    const staff = await owner.get("/api/staff");
    expect(staff.body.members.map((s: { name: string }) => s.name)).toContain("Theo Vance-Okafor");
    const log = await owner.get("/api/audit-events?entityType=user");
    expect(log.body[0]).toMatchObject({ actorName: "Theo Vance-Okafor", actorClientAccountName: null });
  });

  it.each([
    ["an empty name", "", "too_small"],
    ["only spaces", "   ", "too_small"],
    ["101 characters", "x".repeat(101), "too_big"],
    ["5,000 characters", "x".repeat(5000), "too_big"],
    ["a lone surrogate half", "Ana \ud800", "custom"],
    ["a line break", "Ana\nOwner", "custom"],
    ["markup", "<b>Ana</b>", "custom"],
    ["a right-to-left override", "Ana \u202Erenwo", "custom"],
  ])("refuses %s with a 400 naming the field and the rule", async (_what, name, rule) => {
    const client = await t.signIn(demo.manager);
    const response = await client.patch("/api/me").send({ name });
    expect(response.status).toBe(400);
    expect(response.body.error.details).toContainEqual(expect.objectContaining({ field: "name", rule }));
  });

  it("refuses fields other than the name (no changing one's e-mail or role this way)", async () => {
    const client = await t.signIn(demo.client);
    const response = await client.patch("/api/me").send({ name: "Band", email: "owner@wrenfield.test", role: "owner" });
    expect(response.status).toBe(400);
    expect(response.body.error.details).toContainEqual(expect.objectContaining({ field: "email", rule: "unknown_field" }));
  });

  it("keeps a well-formed emoji and accented letters", async () => {
    const client = await t.signIn(demo.bookkeeper);
    const response = await client.patch("/api/me").send({ name: "Zoë 🎧" });
    expect(response.status).toBe(200);
    expect(response.body.name).toBe("Zoë 🎧");
  });
});
