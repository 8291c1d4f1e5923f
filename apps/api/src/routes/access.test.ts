// Walks every route of the OpenAPI document with every role and checks the matrix in docs/roles.md.
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { bookings, calendarFeedTokens, clientAccounts, projects, reels, staffProfiles } from "@takeup/db";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";

const columns = ["signed out", "owner", "manager", "engineer", "bookkeeper", "client"] as const;
type Column = (typeof columns)[number];

function readMatrix(): Map<string, Record<Column, string>> {
  const file = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../../docs/roles.md");
  const rows = new Map<string, Record<Column, string>>();
  for (const line of readFileSync(file, "utf8").split("\n")) {
    const match = line.match(/^\| `([A-Z]+ \/api\/[^`]*)` \|(.*)\|$/);
    if (!match) continue;
    const cells = match[2]!.split("|").map((c) => c.trim());
    rows.set(match[1]!, Object.fromEntries(columns.map((c, i) => [c, cells[i]!])) as Record<Column, string>);
  }
  return rows;
}

let t: TestApp;
let operations: string[];
const agents = new Map<Column, ReturnType<TestApp["client"]>>();
let ownClientId: number;
let otherClientId: number;
let someStaffUserId: string;
/** Bookings: Lantern Static's (the demo client's), and a wrapped one the demo engineer worked on. */
let ids: { clientBooking: number; otherClientBooking: number; engineerBooking: number; otherEngineerBooking: number; otherFeed: number };
/** Issued invoices: the demo client's own and another client's. */
let invoiceIds: { own: number; other: number };
/** Reels: one of Lantern Static's lockout (the demo engineer is on it), and one of Blue Hour's mixes (she is not). */
let reelIds: { own: number; other: number };

beforeAll(async () => {
  t = await createTestApp();
  const doc = (await t.client().get("/api/openapi.json")).body as { paths: Record<string, Record<string, unknown>> };
  operations = Object.entries(doc.paths).flatMap(([p, methods]) => Object.keys(methods).map((m) => `${m.toUpperCase()} ${p}`));
  agents.set("signed out", t.client());
  for (const role of ["owner", "manager", "engineer", "bookkeeper", "client"] as const) agents.set(role, await t.signIn(demo[role]));
  const [own] = await t.db.select().from(clientAccounts).where(eq(clientAccounts.name, "Lantern Static"));
  const [other] = await t.db.select().from(clientAccounts).where(eq(clientAccounts.name, "The Quiet Orchard"));
  ownClientId = own!.id;
  otherClientId = other!.id;
  const [staff] = await t.db.select().from(staffProfiles).where(eq(staffProfiles.role, "engineer")).limit(1);
  someStaffUserId = staff!.userId;
  const all = await t.db.select().from(bookings);
  const byTitle = (title: string) => all.find((b) => b.title === title)!.id;
  // Transitions on a wrapped booking answer 409, so walking the routes changes nothing.
  ids = {
    clientBooking: byTitle("Tracking live (lockout, 3 days)"),
    otherClientBooking: byTitle("Drums and bass"),
    engineerBooking: byTitle("Drums and bass"),
    otherEngineerBooking: byTitle("Mix, songs 1–3"),
    otherFeed: 0,
  };
  const [sam] = await t.db.select().from(staffProfiles).where(eq(staffProfiles.displayName, "Sam Reyes"));
  const [feed] = await t.db.insert(calendarFeedTokens).values({ staffUserId: sam!.userId, tokenHash: "f".repeat(64) }).$returningId();
  ids.otherFeed = feed!.id;
  const manager = agents.get("manager")!;
  const issued = async (clientAccountId: number) => {
    const draft = await manager.post("/api/invoices").send({ clientAccountId, sources: [], manualLines: [{ description: "Check", category: "other", quantity: 1, unitPriceCents: 100 }] });
    await manager.post(`/api/invoices/${draft.body.id}/issue`);
    return draft.body.id as number;
  };
  invoiceIds = { own: await issued(ownClientId), other: await issued(otherClientId) };
  const projectReel = async (name: string) => {
    const [row] = await t.db.select({ id: reels.id }).from(reels).innerJoin(projects, eq(projects.id, reels.projectId)).where(eq(projects.name, name)).limit(1);
    return row!.id;
  };
  reelIds = { own: await projectReel("Harbour Lights"), other: await projectReel("Night Ferries") };
});
afterAll(() => t.close());

/** The path to call, for the caller's own row or (other = true) someone else's. */
function concretePath(template: string, column: Column, other = false) {
  let id: number;
  if (template.startsWith("/api/bookings/")) {
    id = column === "client" ? (other ? ids.otherClientBooking : ids.clientBooking) : other ? ids.otherEngineerBooking : ids.engineerBooking;
  } else if (template.startsWith("/api/invoices/")) {
    id = other ? invoiceIds.other : invoiceIds.own;
  } else if (template.startsWith("/api/reels/")) {
    id = other ? reelIds.other : reelIds.own;
  } else if (template.startsWith("/api/calendar-feeds/")) {
    id = ids.otherFeed;
  } else {
    id = other ? otherClientId : ownClientId;
  }
  return template
    .replace("{id}", String(id))
    .replace("{userId}", someStaffUserId)
    .replace("{paymentId}", "1")
    .replace("{token}", "x".repeat(43));
}

describe("the access matrix in docs/roles.md", () => {
  it("lists exactly the routes of the OpenAPI document", () => {
    expect([...readMatrix().keys()].sort()).toEqual([...operations].sort());
  });

  // Every route × every role takes minutes on a loaded 2-core machine, more than the project's default 30 s.
  it("is what the API does, for every route and every role", async () => {
    const matrix = readMatrix();
    const mismatches: string[] = [];
    // Signing out ends the agent's session, so that route goes last.
    const ordered = [...operations].sort((a, b) => Number(a === "DELETE /api/session") - Number(b === "DELETE /api/session"));
    for (const operation of ordered) {
      const [method, template] = operation.split(" ") as [string, string];
      for (const column of columns) {
        const expected = matrix.get(operation)?.[column];
        const agent = agents.get(column)!;
        const call = (p: string) => agent[method.toLowerCase() as "get"](p);
        const status = (await call(concretePath(template, column))).status;
        const refused = column === "signed out" ? status === 401 : status === 403;
        if (expected === "no" && !refused) mismatches.push(`${operation} as ${column}: expected refusal, got ${status}`);
        if ((expected === "yes" || expected === "own") && (status === 401 || status === 403)) {
          mismatches.push(`${operation} as ${column}: expected access, got ${status}`);
        }
        if (expected === "own" && template.includes("{id}")) {
          const other = (await call(concretePath(template, column, true))).status;
          if (other !== 404) mismatches.push(`${operation} as ${column} on another account: expected 404, got ${other}`);
        }
      }
    }
    expect(mismatches).toEqual([]);
  }, 180_000);
});
