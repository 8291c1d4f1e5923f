import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents, session, staffProfiles, user } from "@takeup/db";
import { createTestApp, linkIn, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
});
afterAll(() => t.close());

const tokenOf = (link: string) => link.split("/invitations/")[1]!;

describe("staff invitations", () => {
  it("invites an engineer by e-mail; the link sets a password, signs them in and gives the role", async () => {
    const invited = await owner.post("/api/staff/invitations").send({ name: "Ada Fenwick", email: "ada@wrenfield.test", role: "engineer" });
    expect(invited.status).toBe(201);
    expect(invited.body).toMatchObject({ email: "ada@wrenfield.test", role: "engineer" });

    const [message] = t.mailTo("ada@wrenfield.test");
    expect(message?.subject).toBe("Wrenfield Sound invites you to join as engineer");
    expect(message?.html).toContain("Accept the invitation");
    const token = tokenOf(linkIn(message!, "/invitations/"));

    const visitor = t.client();
    const preview = await visitor.get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({ name: "Ada Fenwick", role: "engineer", studioName: "Wrenfield Sound" });

    const accepted = await visitor.post(`/api/invitations/${token}/accept`).send({ password: "a-long-new-password" });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ email: "ada@wrenfield.test", role: "engineer" });
    expect((await visitor.get("/api/me")).body.role).toBe("engineer");

    const again = await t.client().post(`/api/invitations/${token}/accept`).send({ password: "a-long-new-password" });
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe("invitation_not_found");
  });

  it("lists the pending invitation until it is accepted", async () => {
    await owner.post("/api/staff/invitations").send({ name: "Basil Crane", email: "basil@wrenfield.test", role: "bookkeeper" });
    const list = await owner.get("/api/staff");
    expect(list.body.invitations.map((i: { email: string }) => i.email)).toContain("basil@wrenfield.test");
    expect(list.body.members.map((m: { name: string }) => m.name)).toContain("Theo Vance");
  });

  it("refuses to invite an address that already has a sign-in (409)", async () => {
    const response = await owner.post("/api/staff/invitations").send({ name: "Theo", email: demo.manager, role: "manager" });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe("email_taken");
  });

  it("replaces an earlier pending invitation to the same address: only the newest link works", async () => {
    await owner.post("/api/staff/invitations").send({ name: "Cal Moss", email: "cal@wrenfield.test", role: "engineer" });
    await owner.post("/api/staff/invitations").send({ name: "Cal Moss", email: "cal@wrenfield.test", role: "engineer" });
    const [newest, older] = t.mailTo("cal@wrenfield.test").reverse();
    expect((await t.client().get(`/api/invitations/${tokenOf(linkIn(older!, "/invitations/"))}`)).status).toBe(404);
    expect((await t.client().get(`/api/invitations/${tokenOf(linkIn(newest!, "/invitations/"))}`)).status).toBe(200);
  });

  it("writes the invitation to the audit log", async () => {
    const events = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "invitation.created"));
    expect(events.length).toBeGreaterThan(0);
    expect(events[0]!.after).toMatchObject({ email: "ada@wrenfield.test", role: "engineer" });
  });
});

describe("changing roles and deactivating", () => {
  async function userIdOf(email: string) {
    const [row] = await t.db.select({ id: user.id }).from(user).where(eq(user.email, email));
    return row!.id;
  }

  it("changes a role, and the member's next request runs with the new role", async () => {
    const jo = await t.signIn("jo@wrenfield.test");
    expect((await jo.get("/api/clients")).status).toBe(403);
    const changed = await owner.patch(`/api/staff/${await userIdOf("jo@wrenfield.test")}`).send({ role: "manager" });
    expect(changed.status).toBe(200);
    expect(changed.body.role).toBe("manager");
    expect((await jo.get("/api/clients")).status).toBe(200);
  });

  it("deactivating ends the member's sessions at once and blocks a new sign-in", async () => {
    const sam = await t.signIn("sam@wrenfield.test");
    const samId = await userIdOf("sam@wrenfield.test");
    const response = await owner.patch(`/api/staff/${samId}`).send({ active: false });
    expect(response.body.active).toBe(false);
    expect(await t.db.select().from(session).where(eq(session.userId, samId))).toEqual([]);
    expect((await sam.get("/api/me")).status).toBe(401);
    const again = await t.client().post("/api/session").send({ email: "sam@wrenfield.test", password: "studio-demo-2026" });
    expect(again.status).toBe(403);
    expect(again.body.error.code).toBe("account_deactivated");
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "staff.deactivated"));
    expect(audit).toMatchObject({ before: { active: true }, after: { active: false } });
  });

  it("keeps at least one active owner (409 last_owner), changing nothing", async () => {
    const ownerId = await userIdOf(demo.owner);
    const response = await owner.patch(`/api/staff/${ownerId}`).send({ role: "manager" });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe("last_owner");
    const [row] = await t.db.select().from(staffProfiles).where(eq(staffProfiles.userId, ownerId));
    expect(row!.role).toBe("owner");
  });

  it("answers 404 for an unknown member", async () => {
    const response = await owner.patch("/api/staff/no-such-user").send({ active: false });
    expect(response.status).toBe(404);
  });
});
