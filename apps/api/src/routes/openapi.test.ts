import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../test/harness.ts";
import type { RegisteredRoute } from "../lib/api-router.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ seed: false });
});
afterAll(() => t.close());

describe("GET /api/openapi.json", () => {
  it("is an OpenAPI 3.1 document with an operation for every mounted route", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body;
    expect(doc.openapi).toBe("3.1.0");
    const documented = Object.entries(doc.paths as Record<string, Record<string, unknown>>).flatMap(([p, ops]) =>
      Object.keys(ops).map((m) => `${m.toUpperCase()} ${p}`),
    );
    const mounted = t.app.routes.map((r: RegisteredRoute) => `${r.method.toUpperCase()} ${(r.fullPath.replace(/\/$/, "") || "/").replace(/:(\w+)/g, "{$1}")}`);
    expect(documented.sort()).toEqual(mounted.sort());
  });

  it("answers every documented operation from a mounted handler, never the API's 404", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body as { paths: Record<string, Record<string, unknown>> };
    for (const [p, ops] of Object.entries(doc.paths)) {
      for (const method of Object.keys(ops)) {
        const url = p.replace(/\{[^}]+\}/g, "1");
        const response = await t.client()[method as "get"](url);
        expect(response.body?.error?.message ?? "", `${method} ${p}`).not.toMatch(/^No API route/);
      }
    }
  });

  it("describes request bodies from the zod contracts, with their limits", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body;
    const invite = doc.paths["/api/staff/invitations"].post.requestBody.content["application/json"].schema;
    expect(invite.required).toEqual(expect.arrayContaining(["name", "email", "role"]));
    expect(invite.properties.name.maxLength).toBe(120);
    expect(invite.additionalProperties).toBe(false);
  });

  it("answers an unknown API path with a JSON 404", async () => {
    const response = await t.client().get("/api/no-such-thing");
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe("not_found");
  });
});
