import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { auditEvents, clientAccounts, projects, reels } from "@takeup/db";
import { labelIdPattern } from "@takeup/domain";
import { binaryBody } from "../../test/binary-body.ts";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { pdfText } from "../../../../../tests/support/pdf-text.ts";

type Agent = Awaited<ReturnType<TestApp["signIn"]>>;
let t: TestApp;
let manager: Agent;
let engineer: Agent;
let client: Agent;
let owner: Agent;
let lanternId: number;
let orchardId: number;
/** A Harbour Lights reel (Lantern Static's lockout; the demo engineer is on it) and a Night Ferries one (Blue Hour's; she is not). */
let ownReel: number;
let otherReel: number;

const reelOf = async (project: string) => {
  const [row] = await t.db.select({ id: reels.id }).from(reels).innerJoin(projects, eq(projects.id, reels.projectId)).where(eq(projects.name, project)).limit(1);
  return row!.id;
};

beforeAll(async () => {
  t = await createTestApp();
  [manager, engineer, client, owner] = await Promise.all([t.signIn(demo.manager), t.signIn(demo.engineer), t.signIn(demo.client), t.signIn(demo.owner)]);
  const accounts = await t.db.select().from(clientAccounts);
  lanternId = accounts.find((c) => c.name === "Lantern Static")!.id;
  orchardId = accounts.find((c) => c.name === "The Quiet Orchard")!.id;
  ownReel = await reelOf("Harbour Lights");
  otherReel = await reelOf("Night Ferries");
});
afterAll(() => t.close());

describe("the vault: reels, their track sheets and labels", () => {
  it("lists all 40 demo reels to staff and only its own to a client, even when it asks for another's", async () => {
    const all = await manager.get("/api/reels");
    expect(all.status).toBe(200);
    expect(all.body).toHaveLength(40);
    const own = await client.get("/api/reels");
    expect(own.body.length).toBeGreaterThan(0);
    expect(own.body.every((r: { clientAccountId: number }) => r.clientAccountId === lanternId)).toBe(true);
    const asked = await client.get(`/api/reels?clientAccountId=${orchardId}`);
    expect(asked.status).toBe(200);
    expect(asked.body).toEqual([]);
  });

  it("answers 404 to a client for another client's reel on every reel route, and refuses it the staff routes", async () => {
    const [orchardReel] = await t.db.select({ id: reels.id, labelId: reels.labelId }).from(reels).where(eq(reels.clientAccountId, orchardId)).limit(1);
    for (const id of [otherReel, orchardReel!.id]) {
      expect((await client.get(`/api/reels/${id}`)).status).toBe(404);
      expect((await client.get(`/api/reels/${id}/label.pdf`)).status).toBe(404);
      expect((await client.patch(`/api/reels/${id}/track-sheet`).send({ tracks: [] })).status).toBe(403);
      expect((await client.patch(`/api/reels/${id}`).send({ shelf: "X" })).status).toBe(403);
      expect((await client.post(`/api/reels/${id}/check-out`).send({ person: "Rosa", reason: "x", dueBack: "2099-01-01" })).status).toBe(403);
      expect((await client.post(`/api/reels/${id}/check-in`).send({ person: "Rosa" })).status).toBe(403);
      expect((await client.post(`/api/reels/${id}/release`).send({ person: "Rosa" })).status).toBe(403);
    }
    expect((await client.get(`/api/reels/scan?label=${orchardReel!.labelId}`)).status).toBe(403);
    expect((await client.post("/api/reels").send({})).status).toBe(403);
    const mine = await client.get(`/api/reels/${ownReel}`);
    expect(mine.status).toBe(200);
    expect(mine.body.canEditTrackSheet).toBe(false);
    expect(mine.body.tracks).toHaveLength(24);
  });

  it("gives a new reel a label id of our format, and names the field of bad input", async () => {
    const made = await manager.post("/api/reels").send({ clientAccountId: orchardId, trackCount: 16, tapeWidthMils: 500, speedIps: 15, shelf: "G-01", contentsNote: "Rough mixes" });
    expect(made.status).toBe(201);
    expect(made.body.labelId).toMatch(labelIdPattern);
    expect(made.body).toMatchObject({ status: "in_vault", noiseReduction: "none", tapeProductId: null, shelf: "G-01" });
    const [audit] = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "reel.created"), eq(auditEvents.entityId, String(made.body.id))));
    expect(audit).toBeDefined();

    const [harbour] = await t.db.select().from(projects).where(eq(projects.name, "Harbour Lights"));
    const wrongProject = await manager.post("/api/reels").send({ clientAccountId: orchardId, projectId: harbour!.id, trackCount: 16, tapeWidthMils: 500, speedIps: 15 });
    expect(wrongProject.status).toBe(400);
    expect(wrongProject.body.error.details[0].field).toBe("projectId");
    const badSpeed = await manager.post("/api/reels").send({ clientAccountId: orchardId, trackCount: 16, tapeWidthMils: 500, speedIps: 9 });
    expect(badSpeed.status).toBe(400);
    expect(JSON.stringify(badSpeed.body.error.details)).toContain("speedIps");
    const noClient = await manager.post("/api/reels").send({ clientAccountId: 999999, trackCount: 16, tapeWidthMils: 500, speedIps: 15 });
    expect(noClient.status).toBe(400);
    expect(noClient.body.error.details[0].field).toBe("clientAccountId");
  });

  it("lets an engineer fill in the track sheet of a reel from her own sessions, and no one else's", async () => {
    const saved = await engineer.patch(`/api/reels/${ownReel}/track-sheet`).send({
      tracks: [
        { trackNo: 1, contents: "Kick in (new mic)" },
        { trackNo: 12, contents: "Bass DI" },
        { trackNo: 13, contents: "" },
      ],
      songs: [
        { title: "Harbour Lights", start: "00:30", keptTakes: "take 3" },
        { title: "Long Way Round", start: "62:05" },
      ],
    });
    expect(saved.status).toBe(200);
    expect(saved.body.tracks).toEqual([
      { trackNo: 1, contents: "Kick in (new mic)" },
      { trackNo: 12, contents: "Bass DI" },
    ]);
    expect(saved.body.songs).toEqual([
      { title: "Harbour Lights", start: "00:30", keptTakes: "take 3" },
      { title: "Long Way Round", start: "62:05", keptTakes: null },
    ]);
    expect(saved.body.canEditTrackSheet).toBe(true);
    expect((await engineer.patch(`/api/reels/${otherReel}/track-sheet`).send({ tracks: [] })).status).toBe(404);

    const beyond = await engineer.patch(`/api/reels/${ownReel}/track-sheet`).send({ tracks: [{ trackNo: 25, contents: "Extra" }] });
    expect(beyond.status).toBe(400);
    expect(beyond.body.error.details[0].field).toBe("tracks.0.trackNo");
    const badStart = await engineer.patch(`/api/reels/${ownReel}/track-sheet`).send({ songs: [{ title: "X", start: "5 minutes" }] });
    expect(badStart.status).toBe(400);
    expect(JSON.stringify(badStart.body.error.details)).toContain("songs.0.start");
    // Nothing of the refused sheets was written.
    expect((await manager.get(`/api/reels/${ownReel}`)).body.tracks).toHaveLength(2);
  });

  it("checks a reel out and back in by its scanned label id, and refuses moves that do not fit its state", async () => {
    const [row] = await t.db.select().from(reels).where(eq(reels.id, otherReel));
    const scanned = await engineer.get(`/api/reels/scan?label=${encodeURIComponent(row!.labelId.toLowerCase().replace(/-/g, " "))}`);
    expect(scanned.status).toBe(200);
    expect(scanned.body.id).toBe(otherReel);
    const out = await engineer.post(`/api/reels/${otherReel}/check-out`).send({ person: "Corin Mayfield", reason: "Transfer to digital", dueBack: "2099-01-31" });
    expect(out.status).toBe(200);
    expect(out.body).toMatchObject({ status: "checked_out", dueBack: "2099-01-31" });
    expect(out.body.movements[0]).toMatchObject({ kind: "check_out", person: "Corin Mayfield", recordedBy: "Priya Oduya" });
    expect((await engineer.post(`/api/reels/${otherReel}/check-out`).send({ person: "Corin Mayfield", reason: "Again", dueBack: "2099-01-31" })).status).toBe(409);
    const back = await engineer.post(`/api/reels/${otherReel}/check-in`).send({ person: "Corin Mayfield" });
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ status: "in_vault", dueBack: null });
    expect(back.body.movements.map((m: { kind: string }) => m.kind)).toEqual(["check_in", "check_out"]);
    expect((await engineer.post(`/api/reels/${otherReel}/check-in`).send({ person: "Corin Mayfield" })).status).toBe(409);

    const past = await engineer.post(`/api/reels/${otherReel}/check-out`).send({ person: "Corin", reason: "x", dueBack: "2001-01-01" });
    expect(past.status).toBe(400);
    expect(past.body.error.details[0].field).toBe("dueBack");
    const typo = row!.labelId.slice(0, -1) + (row!.labelId.endsWith("0") ? "1" : "0");
    const mistyped = await engineer.get(`/api/reels/scan?label=${typo}`);
    expect(mistyped.status).toBe(400);
    expect(mistyped.body.error.details[0].field).toBe("label");
  });

  it("releases a reel to its owner with who collected it, after which it cannot be checked out", async () => {
    const made = await manager.post("/api/reels").send({ clientAccountId: lanternId, trackCount: 2, tapeWidthMils: 250, speedIps: 30 });
    const released = await manager.post(`/api/reels/${made.body.id}/release`).send({ person: "Rosa Delacourt", reason: "Band keeps its master" });
    expect(released.status).toBe(200);
    expect(released.body.status).toBe("released");
    expect(released.body.movements[0]).toMatchObject({ kind: "release", person: "Rosa Delacourt" });
    expect((await manager.post(`/api/reels/${made.body.id}/check-out`).send({ person: "Rosa", reason: "x", dueBack: "2099-01-01" })).status).toBe(409);
    expect((await engineer.post(`/api/reels/${made.body.id}/release`).send({ person: "Rosa" })).status).toBe(403);
  });

  it("prints the box label and track sheet as a PDF with the label id, format, tracks and songs", async () => {
    const reel = (await manager.get(`/api/reels/${ownReel}`)).body;
    const response = await client.get(`/api/reels/${ownReel}/label.pdf`).buffer(true).parse(binaryBody);
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toContain("application/pdf");
    const text = await pdfText(response.body as Buffer);
    expect(text).toContain(reel.labelId);
    expect(text).toContain("Lantern Static");
    expect(text).toContain("24 tracks on 2-inch tape at 15 in/s");
    expect(text).toContain("Track sheet");
    expect(text).toContain("Bass DI");
    expect(text).toContain("Harbour Lights");
  });

  it("edits a reel's shelf as the manager and refuses fewer tracks than its sheet fills", async () => {
    const moved = await manager.patch(`/api/reels/${ownReel}`).send({ shelf: "A-20" });
    expect(moved.status).toBe(200);
    expect(moved.body.shelf).toBe("A-20");
    const shrunk = await manager.patch(`/api/reels/${ownReel}`).send({ trackCount: 8 });
    expect(shrunk.status).toBe(400);
    expect(shrunk.body.error.details[0].field).toBe("trackCount");
    expect((await owner.patch(`/api/reels/${ownReel}`).send({ status: "released" })).status).toBe(400);
  });

  it("answers 400, never 500, to a table of malformed payloads on every vault write", async () => {
    const bad = [null, [], "text", 42, { extra: true }, { person: "" }, { person: "x".repeat(500) }, { trackCount: -1 }, { tracks: "all" }, { songs: [{}] }, { kind: "polish" }, { doneOn: "yesterday" }, { dueBack: "2026-13-45" }, { storageFreeDays: 1.5 }];
    const routes: [string, string][] = [
      ["post", "/api/reels"],
      ["patch", `/api/reels/${ownReel}`],
      ["patch", `/api/reels/${ownReel}/track-sheet`],
      ["post", `/api/reels/${ownReel}/check-out`],
      ["post", `/api/reels/${ownReel}/check-in`],
      ["post", `/api/reels/${ownReel}/release`],
      ["post", "/api/recorders/1/care-events"],
      ["patch", "/api/vault-settings"],
    ];
    const problems: string[] = [];
    for (const [method, path] of routes) {
      for (const body of bad) {
        const response = await owner[method as "post"](path).set("content-type", "application/json").send(JSON.stringify(body));
        if (response.status !== 400) problems.push(`${method} ${path} ${JSON.stringify(body)} → ${response.status}`);
      }
    }
    expect(problems).toEqual([]);
  });
});
