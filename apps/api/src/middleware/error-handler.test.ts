// How the error handler renders the database's own errors (decision 010).
import { describe, expect, it } from "vitest";
import express from "express";
import request from "supertest";
import { errorHandler } from "./error-handler.ts";
import { logger } from "../lib/logger.ts";

function appThrowing(error: unknown, databaseReachable = async () => true) {
  const app = express();
  app.get("/", () => {
    throw error;
  });
  app.use(errorHandler(logger, databaseReachable));
  return app;
}

const wrapped = (cause: object) => Object.assign(new Error("Failed query: insert …"), { cause });

describe("errorHandler", () => {
  it("answers a transaction still deadlocked after its retries with 503 busy and Retry-After", async () => {
    const response = await request(appThrowing(wrapped({ errno: 1213, code: "ER_LOCK_DEADLOCK" }))).get("/");
    expect([response.status, response.body.error.code, response.headers["retry-after"]]).toEqual([503, "busy", "1"]);
  });

  it("answers a lock-wait timeout the same way", async () => {
    const response = await request(appThrowing(wrapped({ errno: 1205, code: "ER_LOCK_WAIT_TIMEOUT" }))).get("/");
    expect([response.status, response.body.error.code]).toEqual([503, "busy"]);
  });

  it("answers a duplicate key no service expected with 409", async () => {
    const response = await request(appThrowing(wrapped({ errno: 1062, code: "ER_DUP_ENTRY" }))).get("/");
    expect([response.status, response.body.error.code]).toEqual([409, "already_exists"]);
  });

  it("answers a refused connection with 503 database_unavailable and Retry-After", async () => {
    const response = await request(appThrowing(wrapped({ code: "ECONNREFUSED" }))).get("/");
    expect([response.status, response.body.error.code, response.headers["retry-after"]]).toEqual([503, "database_unavailable", "5"]);
  });

  it("answers an unknown error with 503 when the database does not answer, and 500 when it does", async () => {
    const down = await request(appThrowing(new Error("Failed to get session"), async () => false)).get("/");
    expect(down.status).toBe(503);
    const bug = await request(appThrowing(new TypeError("x is undefined"), async () => true)).get("/");
    expect([bug.status, bug.body.error.code]).toEqual([500, "internal_error"]);
  });
});
