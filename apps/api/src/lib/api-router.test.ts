// A route declared once in the domain's contracts is mounted by ApiRouter.handle; in tests every
// answer is parsed with the declared schema, so a response that drifts from its contract fails.
import express from "express";
import request from "supertest";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { defineRoute } from "@takeup/domain";
import { errorHandler } from "../middleware/error-handler.ts";
import { ApiRouter } from "./api-router.ts";
import { logger } from "./logger.ts";

const noSessions = { actorFor: async () => null };
const widget = defineRoute({
  method: "get",
  path: "/api/widgets/:id",
  summary: "One widget",
  access: "public",
  params: z.strictObject({ id: z.coerce.number().int() }),
  response: z.object({ id: z.number(), name: z.string() }),
});

function appAnswering(answer: unknown, checkResponses: boolean) {
  const router = new ApiRouter("/api/widgets", "Widgets").handle(widget, async () => answer as { id: number; name: string });
  const app = express();
  app.use(router.base, router.toExpress(noSessions, { checkResponses }));
  app.use(errorHandler(logger));
  return { app, router };
}

describe("routes declared once", () => {
  it("mounts a contract under its router with the path relative to the base", async () => {
    const { app, router } = appAnswering({ id: 7, name: "Reel" }, true);
    expect(router.routes[0]).toMatchObject({ path: "/:id", fullPath: "/api/widgets/:id", tag: "Widgets" });
    const response = await request(app).get("/api/widgets/7");
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ id: 7, name: "Reel" });
  });

  it("fails an answer that breaks its response contract, naming the field", async () => {
    const { app } = appAnswering({ id: "7", name: "Reel" }, true);
    const response = await request(app).get("/api/widgets/7");
    expect(response.status).toBe(500);
    expect(response.body.error.code).toBe("contract_drift");
    expect(response.body.error.message).toMatch(/GET \/api\/widgets\/:id broke its response contract: id:/);
  });

  it("does not parse answers outside tests", async () => {
    const { app } = appAnswering({ id: "7", name: "Reel" }, false);
    expect((await request(app).get("/api/widgets/7")).status).toBe(200);
  });

  it("refuses a contract that does not belong under the router's base", () => {
    expect(() => new ApiRouter("/api/rooms", "Rooms").handle(widget, async () => ({ id: 1, name: "x" }))).toThrow(/does not belong under \/api\/rooms/);
  });
});
