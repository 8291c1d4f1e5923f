// Bad input gets a clear 400 naming the field and the rule, never a 500.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";
import type { RegisteredRoute } from "../lib/api-router.ts";

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

describe("bodies the server cannot read", () => {
  const every = () => (t.app.routes as RegisteredRoute[]).map((r) => ({ method: r.method as "post", path: r.fullPath.replace(/:(\w+)/g, (_, n: string) => (n === "token" ? "a".repeat(43) : n === "userId" ? "someone" : "1")) }));

  it("answers a JSON body declared as latin1 with 415 on every route", async () => {
    const wrong: string[] = [];
    for (const { method, path } of every()) {
      const response = await owner[method](path).set("Content-Type", "application/json; charset=latin1").send('{"name":"Caf\xe9"}');
      if (response.status !== 415 || response.body.error?.code !== "unsupported_charset") wrong.push(`${method} ${path} → ${response.status}`);
    }
    expect(wrong).toEqual([]);
  });

  for (const encoding of ["br", "gzip", "deflate"]) {
    it(`answers Content-Encoding: ${encoding} with junk as 400 on every route`, async () => {
      const wrong: string[] = [];
      for (const { method, path } of every()) {
        const response = await owner[method](path)
          .set("Content-Type", "application/json")
          .set("Content-Encoding", encoding)
          .send(Buffer.from("this is not compressed at all, not even slightly"));
        if (response.status !== 400 || response.body.error?.code !== "unreadable_body") wrong.push(`${method} ${path} → ${response.status}`);
      }
      expect(wrong).toEqual([]);
    });
  }

  it("answers an unknown Content-Encoding with 415", async () => {
    const response = await owner.post("/api/clients").set("Content-Type", "application/json").set("Content-Encoding", "x-squash").send("{}");
    expect([response.status, response.body.error.code]).toEqual([415, "unsupported_encoding"]);
  });
});

describe("strings that are not text", () => {
  it("refuses a lone surrogate in a name with 400 naming the field", async () => {
    const response = await owner.post("/api/clients").set("Content-Type", "application/json").send('{"name":"Band \\ud800","kind":"band"}');
    expect(response.status).toBe(400);
    expect(response.body.error.details).toEqual([{ field: "name", rule: "unpaired_surrogate", message: expect.stringContaining("not valid text") }]);
  });

  it("names a lone surrogate deep inside a list", async () => {
    const response = await owner
      .post("/api/clients")
      .set("Content-Type", "application/json")
      .send('{"name":"Fine","kind":"band","contacts":[{"name":"A"},{"name":"B","note":"x\\udfffy"}]}');
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "contacts.1.note", rule: "unpaired_surrogate" });
  });

  it("accepts a proper surrogate pair (an emoji) in a name", async () => {
    const response = await owner.post("/api/clients").send({ name: "Lantern \u{1F3B8} Club", kind: "band" });
    expect(response.status).toBe(201);
    expect(response.body.name).toBe("Lantern \u{1F3B8} Club");
  });
});

describe("empty changes", () => {
  it("answers an empty PATCH /api/studio with 200 and changes nothing", async () => {
    const before = await owner.get("/api/studio");
    const response = await owner.patch("/api/studio").send({});
    expect(response.status).toBe(200);
    expect(response.body).toEqual(before.body);
  });

  it("answers an empty PATCH /api/payroll-settings with 200 and changes nothing", async () => {
    const before = await owner.get("/api/payroll-settings");
    const response = await owner.patch("/api/payroll-settings").send({});
    expect(response.status).toBe(200);
    expect(response.body).toEqual(before.body);
  });
});

describe("addresses that do not decode", () => {
  it("answers a broken %-escape in an API path with 400", async () => {
    for (const path of ["/api/clients/%", "/api/clients/%E0%A4%A", "/api/invitations/%zz"]) {
      const response = await owner.get(path);
      expect([path, response.status, response.body.error?.code]).toEqual([path, 400, "bad_path"]);
    }
  });
});
