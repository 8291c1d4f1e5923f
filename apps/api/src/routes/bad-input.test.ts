// Bad input gets a clear 400 naming the field and the rule, never a 500.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
});
afterAll(() => t.close());

describe("bad input", () => {
  it("answers malformed JSON with 400 malformed_json", async () => {
    const response = await owner.post("/api/clients").set("Content-Type", "application/json").send('{"name": "Broken",');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe("malformed_json");
  });

  it("names the field and rule for a wrong type", async () => {
    const response = await owner.post("/api/clients").send({ name: 42, kind: "band" });
    expect(response.status).toBe(400);
    expect(response.body.error).toMatchObject({ code: "invalid_input", details: [{ field: "name", rule: "invalid_type" }] });
  });

  it("names an unknown field", async () => {
    const response = await owner.post("/api/staff/invitations").send({ name: "A", email: "a@b.test", role: "engineer", salary: 1 });
    expect(response.status).toBe(400);
    expect(response.body.error.details).toEqual([{ field: "salary", rule: "unknown_field", message: expect.stringContaining("salary") }]);
  });

  it("names an over-long string with its limit", async () => {
    const response = await owner.post("/api/clients").send({ name: "x".repeat(121), kind: "band" });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "name", rule: "too_big", message: "Use at most 120 characters" });
  });

  it("names an invalid choice", async () => {
    const response = await owner.post("/api/staff/invitations").send({ name: "A", email: "a@b.test", role: "janitor" });
    expect(response.body.error.details[0]).toMatchObject({ field: "role", rule: "invalid_value" });
  });

  it("refuses a bad e-mail address", async () => {
    const response = await owner.post("/api/staff/invitations").send({ name: "A", email: "not-an-address", role: "engineer" });
    expect(response.body.error.details[0]).toMatchObject({ field: "email", message: "Enter a valid e-mail address" });
  });

  it("refuses a body that is not an object", async () => {
    const response = await owner.post("/api/clients").send([1, 2]);
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("(body)");
  });

  it("refuses a non-numeric id in the path", async () => {
    const response = await owner.get("/api/clients/abc");
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("id");
  });

  it("refuses an unknown time zone in the studio settings", async () => {
    const response = await owner.patch("/api/studio").send({ timeZone: "Mars/Olympus" });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "timeZone", message: expect.stringContaining("IANA") });
  });

  it("refuses a body over the size limit with 413", async () => {
    const response = await owner.post("/api/clients").send({ name: "Big", kind: "band", notes: "x".repeat(300_000) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe("body_too_large");
  });

  it("refuses a too-short password when accepting an invitation", async () => {
    const response = await t.client().post(`/api/invitations/${"a".repeat(43)}/accept`).send({ password: "short" });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "password", message: "Use at least 10 characters" });
  });
});
