import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { demoIds } from "../bookings/test-helpers.ts";

let t: TestApp;
let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  t = await createTestApp();
  ids = await demoIds(t);
});
afterAll(() => t.close());

describe("calendar feeds", () => {
  it("tells caches not to keep a feed, so a revoked address stops at once everywhere", async () => {
    const manager = await t.signIn(demo.manager);
    const created = await manager.post("/api/calendar-feeds").send({ roomId: ids.room("Room A") });
    const feed = await t.client().get(new URL(created.body.url).pathname);
    expect(feed.status).toBe(200);
    expect(feed.headers["cache-control"]).toBe("no-store");
  });

  it("answers 404 to revoking a feed that is already revoked, and audits one revocation", async () => {
    const manager = await t.signIn(demo.manager);
    const created = await manager.post("/api/calendar-feeds").send({ roomId: ids.room("Room A") });
    expect((await manager.delete(`/api/calendar-feeds/${created.body.id}`)).status).toBe(204);
    const again = await manager.delete(`/api/calendar-feeds/${created.body.id}`);
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe("not_found");
    const owner = await t.signIn(demo.owner);
    const log = (await owner.get("/api/audit-events?entityType=calendar_feed")).body as { action: string; entityId: string }[];
    expect(log.filter((e) => e.action === "calendar_feed.revoked" && e.entityId === String(created.body.id))).toHaveLength(1);
  });

  it("answers an engineer's feed for someone else with 404, as docs/roles.md says for others' rows", async () => {
    const engineer = await t.signIn(demo.engineer);
    const response = await engineer.post("/api/calendar-feeds").send({ staffUserId: ids.person("Sam Reyes") });
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe("not_found");
  });
});
