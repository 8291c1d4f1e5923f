import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { apiErrorCodes } from "@takeup/domain";
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

  it("answers every documented operation from a mounted handler: 401 signed out, never the API's 404 or a 5xx", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body as { paths: Record<string, Record<string, { "x-access": unknown }>> };
    for (const [p, ops] of Object.entries(doc.paths)) {
      for (const [method, operation] of Object.entries(ops)) {
        const url = p.replace(/\{[^}]+\}/g, "1");
        const response = await t.client()[method as "get"](url);
        const call = `${method.toUpperCase()} ${p} → ${response.status}`;
        expect(response.body?.error?.message ?? "", call).not.toMatch(/^No API route/);
        expect(response.status, call).toBeLessThan(500);
        if (operation["x-access"] !== "public") expect(response.status, call).toBe(401);
      }
    }
  });

  it("documents the error shape from the same contract the web parses", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body;
    const error = doc.components.schemas.Error;
    expect(error.required).toEqual(["error"]);
    expect(error.properties.error.required).toEqual(expect.arrayContaining(["code", "message"]));
    expect(error.properties.error.properties.details.items.required).toEqual(expect.arrayContaining(["field", "rule", "message"]));
  });

  it("lists every error code the API may answer with, from the one union HttpError accepts", async () => {
    const doc = (await t.client().get("/api/openapi.json")).body;
    const code = doc.components.schemas.Error.properties.error.properties.code;
    expect(code.type).toBe("string");
    expect(code.enum).toEqual([...apiErrorCodes]);
    expect(code.enum).toEqual(expect.arrayContaining(["invalid_input", "booking_conflict", "contract_drift", "too_many_attempts"]));
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
