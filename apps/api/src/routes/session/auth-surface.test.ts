import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { session, user } from "@takeup/db";
import { appUrl, createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let server: http.Server;
beforeAll(async () => {
  t = await createTestApp();
  server = t.app.listen(0, "127.0.0.1");
  await new Promise((resolve) => server.once("listening", resolve));
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

type Raw = { status: number; headers: http.IncomingHttpHeaders; body: string };

/** Sends the path exactly as written: no client-side normalisation of dots, slashes or escapes. */
function raw(method: string, path: string, body?: unknown, cookie?: string): Promise<Raw> {
  const { port } = server.address() as AddressInfo;
  const payload = body === undefined ? undefined : JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: "127.0.0.1",
        port,
        method,
        path,
        headers: {
          origin: appUrl,
          ...(payload ? { "content-type": "application/json", "content-length": Buffer.byteLength(payload) } : {}),
          ...(cookie ? { cookie } : {}),
        },
      },
      (res) => {
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (chunk: string) => (text += chunk));
        res.on("end", () => resolve({ status: res.statusCode!, headers: res.headers, body: text }));
      },
    );
    req.on("error", reject);
    req.end(payload);
  });
}

/** Ways of writing a path that a lenient router might take for better-auth's own endpoint. */
function spellings(endpoint: string): string[] {
  const [first, ...rest] = endpoint.split("/");
  const tail = rest.join("/");
  return [
    `/api/auth/${endpoint}`,
    `/api/auth/./${endpoint}`,
    `/api/auth/x/../${endpoint}`,
    `/api/auth/%2E/${endpoint}`,
    `/api/auth/%2e%2e/auth/${endpoint}`,
    `/api/x/%2e%2e/auth/${endpoint}`,
    ...(tail ? [`/api/auth/${first}/./${tail}`, `/api/auth/${first}%2F${tail}`, `/api/auth/${first}%2f${tail}`] : []),
    `/api/auth//${endpoint}`,
    `//api/auth/${endpoint}`,
    `/api//auth/${endpoint}`,
    `/API/AUTH/${endpoint.toUpperCase()}`,
    `/Api/Auth/${endpoint}`,
    `/api/auth/${endpoint}/`,
    `/api/auth/${endpoint}?x=1`,
    `/api/auth/${endpoint};jsessionid=1`,
    `/api/auth\\${endpoint.replace("/", "\\")}`,
    `/api\\auth/${endpoint}`,
    `/api/%61uth/${endpoint}`,
    `/%61pi/auth/${endpoint}`,
    `/api/auth/${endpoint}%00`,
    `/api/auth/${endpoint}%20`,
    `/api/auth/${endpoint}.json`,
    `/api/./auth/${endpoint}`,
    `/./api/auth/${endpoint}`,
  ];
}

const betterAuthEndpoints = [
  ["POST", "sign-in/email"],
  ["POST", "sign-up/email"],
  ["GET", "get-session"],
  ["POST", "update-user"],
  ["POST", "change-password"],
  ["POST", "change-email"],
  ["POST", "request-password-reset"],
  ["POST", "forget-password"],
  ["POST", "reset-password"],
  ["GET", "reset-password/abcdefghijkl"],
  ["GET", "list-sessions"],
  ["POST", "revoke-sessions"],
  ["POST", "delete-user"],
  ["POST", "sign-out"],
  ["GET", "ok"],
] as const;

describe("better-auth's HTTP surface", () => {
  it("answers 404 (or 400 for a malformed path) to every spelling of every better-auth endpoint, even with the right password", async () => {
    const reached: string[] = [];
    for (const [method, endpoint] of betterAuthEndpoints) {
      for (const path of spellings(endpoint)) {
        const body = method === "POST" ? { email: demo.owner, password: "studio-demo-2026", name: "Mallory (Owner)" } : undefined;
        const response = await raw(method, path, body);
        const ours = response.status === 404 || response.status === 400;
        if (!ours || response.headers["set-cookie"] || response.body.includes("token")) {
          reached.push(`${method} ${path} → ${response.status} ${response.body.slice(0, 80)}`);
        }
      }
    }
    expect(reached).toEqual([]);
    const [owner] = await t.db.select({ name: user.name }).from(user).where(eq(user.email, demo.owner));
    expect(owner!.name).toBe("Mara Linden");
  });

  it("never puts a raw session token in a response body", async () => {
    const signIn = await raw("POST", "/api/session", { email: demo.bookkeeper, password: "studio-demo-2026" });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers["set-cookie"]!.map((c) => c.split(";")[0]).join("; ");
    const [bookkeeper] = await t.db.select({ id: user.id }).from(user).where(eq(user.email, demo.bookkeeper));
    const tokens = (await t.db.select({ token: session.token }).from(session).where(eq(session.userId, bookkeeper!.id))).map((s) => s.token);
    expect(tokens.length).toBeGreaterThan(0);
    const bodies = [signIn.body];
    for (const path of ["/api/me", "/api/session", "/api/openapi.json", ...spellings("get-session"), ...spellings("list-sessions")]) {
      bodies.push((await raw("GET", path, undefined, cookie)).body);
    }
    for (const body of bodies) for (const token of tokens) expect(body).not.toContain(token);
  });
  it("counts 30 wrong passwords through any spelling toward one limit: our sign-in answers 429, nothing signs in", async () => {
    const theirs = spellings("sign-in/email");
    const ours = ["/api/session", "/api/session/", "/API/SESSION", "/api/session?x=1", "/api/Session"];
    const paths = [...theirs, ...ours];
    const statuses: number[] = [];
    for (let i = 0; i < 30; i++) {
      const path = i % 2 === 0 ? theirs[(i / 2) % theirs.length]! : ours[((i - 1) / 2) % ours.length]!;
      const response = await raw("POST", path, { email: demo.engineer, password: `wrong-${i}` });
      expect(response.headers["set-cookie"]).toBeUndefined();
      statuses.push(response.status);
    }
    expect(statuses.filter((s) => s === 200)).toEqual([]);
    expect(statuses).toContain(429);
    for (const path of paths) {
      const right = await raw("POST", path, { email: demo.engineer, password: "studio-demo-2026" });
      expect(right.headers["set-cookie"], path).toBeUndefined();
      expect([400, 404, 429], path).toContain(right.status);
    }
  });

});
