// Malformed input, generated from the OpenAPI document with a fixed seed, sent to every mutating
// route signed in as the owner: whatever arrives, the answer is never a 5xx (issue 8, item 7).
// Each route gets structured payloads built from its own request schema (real field names with
// wrong types, huge or broken strings, absurd dates and numbers, nulls, nested junk) and raw
// bodies the JSON reader must refuse (bad JSON, odd charsets and encodings, broken paths).
import { gzipSync } from "node:zlib";
import type { AddressInfo } from "node:net";
import type { Server } from "node:http";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { appUrl, createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";

const seed = 20261202;
const structuredPerRoute = 102;
const concurrency = 8;

type Json = Record<string, unknown> & {
  type?: string;
  properties?: Record<string, Json>;
  items?: Json;
  anyOf?: Json[];
  oneOf?: Json[];
  enum?: unknown[];
  const?: unknown;
  format?: string;
  maxLength?: number;
  minimum?: number;
  maximum?: number;
};

const loneSurrogates = ["\ud800", "Band \udfff", "x\ud83d", "\udc00\ud800"];
const absurdDates = [
  "0999-01-01T00:00:00Z",
  "0000-01-01T00:00:00Z",
  "9999-12-31T23:59:59.999Z",
  "+275760-09-13T00:00:00.000Z",
  "-000001-01-01T00:00:00Z",
  "2026-02-30T10:00:00Z",
  "2026-01-01T25:61:00Z",
  "2036-06-01T10:00:00+14:00",
  "1970-01-01T00:00:00Z",
  "2026-13-01",
  "yesterday",
  "",
];
const absurdDays = ["0000-00-00", "0001-01-01", "9999-12-31", "2026-02-30", "1900-02-29", "26-1-1", "2026-1-1"];
const hugeStrings = ["x".repeat(100_000), "é".repeat(60_000), "\u{1F3B8}".repeat(30_000)];
const oddStrings = [
  "",
  "   ",
  "\u0000",
  "\u200b\u200f\u202e",
  "=HYPERLINK(\"http://evil.test\")",
  "<script>alert(1)</script>",
  "'; drop table bookings; --",
  "../../etc/passwd",
  "%00%ff",
  "😀".repeat(5),
  "Ω≈ç√∫",
];
const oddNumbers = [0, -0, -1, 1, 0.5, -0.0001, 2 ** 31, 2 ** 32 + 1, 2 ** 53, 2 ** 53 + 2, -(2 ** 53), 1e21, 1e308, -1e308, 5e-324];

const junk: fc.Arbitrary<unknown> = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(...oddNumbers),
  fc.string({ maxLength: 20 }),
  fc.constantFrom(...loneSurrogates, ...oddStrings, ...absurdDates, ...hugeStrings),
  fc.jsonValue({ maxDepth: 3 }),
  fc.array(fc.constant(null), { maxLength: 3 }),
  fc.constant({ __proto__: { polluted: true }, constructor: { prototype: { polluted: true } } }),
  fc.constant(JSON.parse('{"__proto__":{"admin":true}}')),
);

function stringFor(s: Json): fc.Arbitrary<unknown> {
  const options: fc.Arbitrary<unknown>[] = [fc.string({ maxLength: 30 }), fc.constantFrom(...oddStrings, ...loneSurrogates)];
  if (s.maxLength !== undefined) options.push(fc.constantFrom("a".repeat(s.maxLength), "a".repeat(s.maxLength + 1), `${"a".repeat(Math.max(0, s.maxLength - 1))}\ud800`));
  if (s.format === "date-time") options.push(fc.constantFrom(...absurdDates), fc.constant(new Date().toISOString()));
  if (s.format === "date") options.push(fc.constantFrom(...absurdDays));
  if (s.format === "email") options.push(fc.constantFrom("a@b.test", "not-an-address", `${"a".repeat(250)}@b.test`, "owner@wrenfield.test", "a\ud800@b.test"));
  return fc.oneof(...options);
}

function numberFor(s: Json): fc.Arbitrary<unknown> {
  const min = typeof s.minimum === "number" ? s.minimum : -1_000_000;
  const max = typeof s.maximum === "number" ? Math.min(s.maximum, 1e12) : 1_000_000;
  const low = Math.max(Math.ceil(min), -(2 ** 31));
  const high = Math.max(low, Math.min(Math.floor(max), 2 ** 31));
  return fc.oneof(fc.constantFrom(...oddNumbers, min - 1, max + 1, min, max), fc.integer({ min: low, max: high }));
}

/** A value that is mostly shaped like the schema, sometimes broken, sometimes plain junk. */
function valueFor(s: Json, depth: number): fc.Arbitrary<unknown> {
  const plausible: fc.Arbitrary<unknown>[] = [];
  for (const alternative of s.anyOf ?? s.oneOf ?? []) plausible.push(valueFor(alternative, depth + 1));
  if (s.enum) plausible.push(fc.constantFrom(...s.enum));
  if (s.const !== undefined) plausible.push(fc.constant(s.const));
  if (s.type === "string") plausible.push(stringFor(s));
  if (s.type === "integer" || s.type === "number") plausible.push(numberFor(s));
  if (s.type === "boolean") plausible.push(fc.boolean());
  if (s.type === "array" && depth < 4) plausible.push(fc.array(valueFor(s.items ?? {}, depth + 1), { maxLength: 4 }), fc.constant(Array.from({ length: 500 }, () => ({}))));
  if (s.type === "object" && depth < 4) plausible.push(objectFor(s, depth + 1));
  if (plausible.length === 0) return junk;
  return fc.oneof({ arbitrary: junk, weight: 1 }, ...plausible.map((arbitrary) => ({ arbitrary, weight: 3 })));
}

function objectFor(s: Json, depth: number): fc.Arbitrary<Record<string, unknown>> {
  const properties = Object.entries(s.properties ?? {});
  const record = fc.record(Object.fromEntries(properties.map(([key, property]) => [key, valueFor(property, depth)])), { requiredKeys: [] });
  // Now and then an extra field nobody declared.
  return fc.tuple(record, fc.option(fc.tuple(fc.constantFrom("extra", "__proto__", "id", "role", ""), junk), { freq: 6 })).map(([r, extra]) => {
    const value: Record<string, unknown> = { ...r };
    if (extra) Object.defineProperty(value, extra[0], { value: extra[1], enumerable: true, configurable: true, writable: true });
    return value;
  });
}

function payloadsFor(schema: Json | undefined, routeSeed: number): unknown[] {
  const arbitrary = schema ? fc.oneof({ arbitrary: objectFor(schema, 0), weight: 6 }, { arbitrary: junk, weight: 1 }) : junk;
  return fc.sample(arbitrary, { seed: routeSeed, numRuns: structuredPerRoute });
}

type RawCase = { label: string; body?: string | Buffer; headers?: Record<string, string>; path?: (path: string) => string };

const deepArray = "[".repeat(5_000) + "]".repeat(5_000);
const deepObject = '{"a":'.repeat(2_000) + "1" + "}".repeat(2_000);
const rawCases: RawCase[] = [
  ...['{"name": "Broken",', "{", "[1,", "nul", "tru", '{"a":1}garbage', "{'single':'quotes'}", '{"a":01}', '{"a":1e999999}', '{"a":"\\ud800"}', '{"a":"\\x41"}', '"just a string"', "42", "null", "[]", '{"a":NaN}', "\u0000", "\ufeff{}", deepArray, deepObject, '{"a":1,"a":2}', `{"name":"${"x".repeat(250_000)}"}`].map(
    (body, i): RawCase => ({ label: `bad JSON ${i}`, body, headers: { "content-type": "application/json" } }),
  ),
  { label: "latin1 charset", body: '{"name":"Caf\xe9"}', headers: { "content-type": "application/json; charset=latin1" } },
  { label: "utf-16 charset", body: Buffer.from('{"name":"x"}', "utf16le"), headers: { "content-type": "application/json; charset=utf-16" } },
  { label: "made-up charset", body: "{}", headers: { "content-type": "application/json; charset=klingon" } },
  { label: "br junk", body: Buffer.from("not brotli at all"), headers: { "content-type": "application/json", "content-encoding": "br" } },
  { label: "gzip junk", body: Buffer.from("not gzip at all"), headers: { "content-type": "application/json", "content-encoding": "gzip" } },
  { label: "deflate junk", body: Buffer.from("not deflate"), headers: { "content-type": "application/json", "content-encoding": "deflate" } },
  { label: "gzip of bad JSON", body: gzipSync('{"a":'), headers: { "content-type": "application/json", "content-encoding": "gzip" } },
  { label: "gzip bomb-ish", body: gzipSync(`{"name":"${"a".repeat(1_000_000)}"}`), headers: { "content-type": "application/json", "content-encoding": "gzip" } },
  { label: "two encodings", body: Buffer.from("junk"), headers: { "content-type": "application/json", "content-encoding": "gzip, br" } },
  { label: "unknown encoding", body: "{}", headers: { "content-type": "application/json", "content-encoding": "x-squash" } },
  { label: "form body", body: "name=a&kind=band", headers: { "content-type": "application/x-www-form-urlencoded" } },
  { label: "text body", body: "hello", headers: { "content-type": "text/plain" } },
  { label: "multipart body", body: "--x\r\nContent-Disposition: form-data; name=\"a\"\r\n\r\n1\r\n--x--", headers: { "content-type": "multipart/form-data; boundary=x" } },
  { label: "no content type", body: '{"name":"a"}', headers: {} },
  ...["%", "%zz", "%E0%A4%A", "%ED%A0%80", "-1", "0", "1.5", "1e3", "99999999999999999999999", "%00", "1;select%201", " 1"].map(
    (segment): RawCase => ({ label: `path segment ${segment}`, body: "{}", headers: { "content-type": "application/json" }, path: (p) => p.replace("/1", `/${segment}`).replace("/someone", `/${segment}`).replace(/\/a{43}/, `/${segment}`) }),
  ),
  { label: "junk query", body: "{}", headers: { "content-type": "application/json" }, path: (p) => `${p}?a[b][c]=1&__proto__[x]=1&format=%ff&x=${"y".repeat(5_000)}` },
];

let t: TestApp;
let server: Server;
let base: string;
let cookie: string;
beforeAll(async () => {
  t = await createTestApp();
  const signIn = await t.client().post("/api/session").send({ email: demo.owner, password: "studio-demo-2026" });
  cookie = signIn.headers["set-cookie"]![0]!.split(";")[0]!;
  server = t.app.listen(0, "127.0.0.1");
  await new Promise((resolve) => server.once("listening", resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

type Operation = { method: string; path: string; schema?: Json };

async function send(op: Operation, body: string | Buffer | undefined, headers: Record<string, string>, path = op.path) {
  const response = await fetch(base + path, {
    method: op.method.toUpperCase(),
    headers: { origin: appUrl, cookie, ...headers },
    body: op.method === "get" || body === undefined ? undefined : typeof body === "string" ? body : new Uint8Array(body),
  });
  const text = await response.text();
  return { status: response.status, text };
}

async function inParallel<T>(items: T[], work: (item: T) => Promise<void>) {
  let next = 0;
  await Promise.all(Array.from({ length: concurrency }, async () => {
    while (next < items.length) await work(items[next++]!);
  }));
}

describe("fuzzing every mutating route", () => {
  it(`answers ${structuredPerRoute + rawCases.length} malformed payloads on every mutating route of the OpenAPI document without a 5xx`, async () => {
    const doc = (await t.client().get("/api/openapi.json")).body as { paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: Json }> } }>> };
    const operations: Operation[] = [];
    for (const [path, methods] of Object.entries(doc.paths)) {
      for (const [method, operation] of Object.entries(methods)) {
        if (!["post", "patch", "put", "delete"].includes(method)) continue;
        const concrete = path.replace(/\{(\w+)\}/g, (_, name: string) => (name === "token" ? "a".repeat(43) : name === "userId" ? "someone" : "1"));
        operations.push({ method, path: concrete, schema: operation.requestBody?.content["application/json"]?.schema });
      }
    }
    expect(operations.length).toBeGreaterThan(30);

    const failures: string[] = [];
    let sent = 0;
    const casesFor = (op: Operation, index: number) => [
      ...payloadsFor(op.schema, seed + index).map((payload, i) => ({
        op,
        label: `payload ${i}: ${JSON.stringify(payload)?.slice(0, 160)}`,
        run: () => send(op, JSON.stringify(payload) ?? "null", { "content-type": "application/json" }),
      })),
      ...rawCases.map((c) => ({ op, label: c.label, run: () => send(op, c.body, c.headers ?? {}, c.path ? c.path(op.path) : op.path) })),
    ];
    const run = async (c: ReturnType<typeof casesFor>[number]) => {
      const { status, text } = await c.run();
      sent++;
      if (status >= 500) failures.push(`${c.op.method.toUpperCase()} ${c.op.path} ${c.label} → ${status} ${text.slice(0, 200)}`);
    };
    const signOut = operations.filter((op) => op.method === "delete" && op.path === "/api/session");
    const others = operations.filter((op) => !signOut.includes(op));
    // One queue across routes keeps every connection busy; signing out would end the owner's
    // session for the rest, so that route goes last.
    await inParallel(others.flatMap((op) => casesFor(op, operations.indexOf(op))), run);
    await inParallel(signOut.flatMap((op) => casesFor(op, operations.indexOf(op))), run);
    expect(sent).toBeGreaterThanOrEqual(operations.length * 150);
    expect(failures).toEqual([]);
  }, 240_000);
});
