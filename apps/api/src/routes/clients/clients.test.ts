import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents, clientAccounts, clientContacts } from "@takeup/db";
import { createTestApp, linkIn, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await createTestApp();
  manager = await t.signIn(demo.manager);
});
afterAll(() => t.close());

const idOf = async (name: string) => (await t.db.select().from(clientAccounts).where(eq(clientAccounts.name, name)))[0]!.id;

describe("client accounts", () => {
  it("lists the demo clients with their primary contact", async () => {
    const response = await manager.get("/api/clients");
    expect(response.status).toBe(200);
    const lantern = response.body.find((c: { name: string }) => c.name === "Lantern Static");
    expect(lantern).toMatchObject({ kind: "band", primaryContact: "Rosa Delacourt", userCount: 1 });
    const label = response.body.find((c: { name: string }) => c.name === "Blue Hour Records");
    expect(label).toMatchObject({ kind: "label", primaryContact: "Corin Mayfield", userCount: 0 });
  });

  it("creates a client with contacts in one transaction and audits it", async () => {
    const response = await manager.post("/api/clients").send({
      name: "Marrow Lane",
      kind: "band",
      email: "hello@marrowlane.test",
      contacts: [
        { name: "Ivy Marrow", email: "ivy@marrowlane.test", note: "Vocals" },
        { name: "Otto Lane", email: "", isPrimary: true },
      ],
    });
    expect(response.status).toBe(201);
    expect(response.body.contacts).toEqual([
      expect.objectContaining({ name: "Ivy Marrow", isPrimary: false }),
      expect.objectContaining({ name: "Otto Lane", email: null, isPrimary: true }),
    ]);
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "client.created"));
    expect(audit!.entityId).toBe(String(response.body.id));
  });

  it("refuses a duplicate name with 409 and writes nothing", async () => {
    const before = await t.db.select().from(clientContacts);
    const response = await manager.post("/api/clients").send({ name: "Copper Vale", kind: "band", contacts: [{ name: "Someone" }] });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe("client_exists");
    expect(await t.db.select().from(clientContacts)).toHaveLength(before.length);
  });

  it("rolls back the account when a contact fails to save (nothing half-written)", async () => {
    const response = await manager.post("/api/clients").send({ name: "Half Written", kind: "label", contacts: [{ name: "x".repeat(121) }] });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("contacts.0.name");
    expect(await t.db.select().from(clientAccounts).where(eq(clientAccounts.name, "Half Written"))).toEqual([]);
  });

  it("updates fields and replaces contacts, keeping before and after in the audit log", async () => {
    const id = await idOf("Blue Hour Records");
    const response = await manager.patch(`/api/clients/${id}`).send({ phone: "555-0199", contacts: [{ name: "Corin Mayfield" }] });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ phone: "555-0199", contacts: [expect.objectContaining({ name: "Corin Mayfield", isPrimary: true })] });
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "client.updated"));
    expect(audit!.before).toMatchObject({ phone: "555-0155" });
    expect(audit!.after).toMatchObject({ phone: "555-0199" });
  });

  it("invites a client user who, once signed in, sees only that client account", async () => {
    const id = await idOf("Copper Vale");
    const invited = await manager.post(`/api/clients/${id}/invitations`).send({ name: "Nell Brightwater", email: "nell@coppervale.test" });
    expect(invited.status).toBe(201);
    const [message] = t.mailTo("nell@coppervale.test");
    expect(message!.subject).toContain("Copper Vale");
    const token = linkIn(message!, "/invitations/").split("/invitations/")[1];
    const nell = t.client();
    const accepted = await nell.post(`/api/invitations/${token}/accept`).send({ password: "copper-vale-pass" });
    expect(accepted.body).toMatchObject({ role: "client", clientAccount: { id, name: "Copper Vale" } });
    expect((await nell.get(`/api/clients/${id}`)).status).toBe(200);
    expect((await nell.get(`/api/clients/${await idOf("Lantern Static")}`)).status).toBe(404);
    expect((await nell.get("/api/clients")).status).toBe(403);
  });

  it("deactivating a client user ends its session", async () => {
    const id = await idOf("The Quiet Orchard");
    const band = await t.signIn(demo.otherClient);
    const detail = await manager.get(`/api/clients/${id}`);
    const userId = detail.body.users[0].userId;
    const response = await manager.patch(`/api/clients/${id}/users/${userId}`).send({ active: false });
    expect(response.body.users[0].active).toBe(false);
    expect((await band.get("/api/me")).status).toBe(401);
  });

  it("gives a bookkeeper read access but no writes", async () => {
    const books = await t.signIn(demo.bookkeeper);
    expect((await books.get("/api/clients")).status).toBe(200);
    expect((await books.post("/api/clients").send({ name: "Nope", kind: "band" })).status).toBe(403);
  });
});
