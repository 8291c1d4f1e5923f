import type { ErrorRequestHandler, Request, RequestHandler, Response } from "express";
import { ZodError } from "zod";
import { isDatabaseUnavailableError, isDuplicateKeyError, isRetryableWriteError } from "@takeup/db";
import { retryAfterSeconds, type DatabaseProbe } from "../lib/database-probe.ts";
import { HttpError, type ErrorDetail } from "../lib/http-error.ts";
import type { Logger } from "../lib/logger.ts";

export function zodDetails(error: ZodError): ErrorDetail[] {
  return error.issues.flatMap((issue) => {
    const at = issue.path.map(String).join(".");
    if (issue.code === "unrecognized_keys") {
      return issue.keys.map((key) => ({
        field: at ? `${at}.${key}` : key,
        rule: "unknown_field",
        message: `${key} is not a field this request accepts`,
      }));
    }
    return [{ field: at || "(body)", rule: issue.code, message: issue.message }];
  });
}

export const notFoundJson: RequestHandler = (req) => {
  throw new HttpError(404, "not_found", `No API route ${req.method} ${req.originalUrl.split("?")[0]}`);
};

const databaseUnavailable = () =>
  new HttpError(503, "database_unavailable", "The studio's database cannot be reached just now; try again in a few seconds");

/**
 * Renders every error as {"error":{code,message,details?}}; internals never leave the server.
 * A database that cannot be reached is 503 with Retry-After, on every route; so is a write that
 * kept deadlocking after its retries (decision 010). A unique key nobody caught is 409.
 */
export function errorHandler(logger: Logger, databaseReachable: DatabaseProbe = async () => true): ErrorRequestHandler {
  return (err, req, res, _next) => {
    void render(err, req, res).catch(() => {
      if (!res.headersSent) res.status(500).end();
    });
  };

  async function render(err: unknown, req: Request, res: Response) {
    if (res.headersSent) return res.end();
    let error: HttpError;
    let retryAfter: number | undefined;
    if (err instanceof HttpError) {
      error = err;
    } else if (err instanceof ZodError) {
      const details = zodDetails(err);
      const summary = details.map((d) => `${d.field}: ${d.message}`).join("; ");
      error = new HttpError(400, "invalid_input", `Check the request: ${summary}`, details);
    } else if (isBodyParserError(err)) {
      error = bodyParserError(err);
    } else if (isRetryableWriteError(err)) {
      logger.warn("transaction gave up after its retries", { method: req.method, path: req.originalUrl });
      error = new HttpError(503, "busy", "The studio is busy with other changes to the same records; try again");
      retryAfter = retryAfterSeconds.busy;
    } else if (isDuplicateKeyError(err)) {
      error = new HttpError(409, "already_exists", "This would duplicate a record that already exists");
    } else if (isDatabaseUnavailableError(err) || !(await databaseReachable())) {
      logger.warn("database unavailable", { method: req.method, path: req.originalUrl, error: err instanceof Error ? err.message : String(err) });
      error = databaseUnavailable();
      retryAfter = retryAfterSeconds.unavailable;
    } else {
      logger.error("unhandled error", {
        method: req.method,
        path: req.originalUrl,
        error: err instanceof Error ? { name: err.name, message: err.message, stack: err.stack } : String(err),
      });
      error = new HttpError(500, "internal_error", "Something went wrong on our side; it has been logged");
    }
    if (retryAfter !== undefined) res.setHeader("retry-after", String(retryAfter));
    res.status(error.status).json({
      error: { code: error.code, message: error.message, ...(error.details ? { details: error.details } : {}) },
    });
  }
}

/** express.json()'s own errors (http-errors with a 4xx status): too large, bad charset or encoding, bad JSON. */
function isBodyParserError(err: unknown): err is { type?: string; status: number; message: string } {
  return (
    typeof err === "object" &&
    err !== null &&
    "status" in err &&
    typeof err.status === "number" &&
    err.status >= 400 &&
    err.status < 500 &&
    (("type" in err && typeof err.type === "string") || ("expose" in err && err.expose === true))
  );
}

function bodyParserError(err: { type?: string; status: number }): HttpError {
  switch (err.type) {
    case "entity.too.large":
      return new HttpError(413, "body_too_large", "The request body is too large");
    case "charset.unsupported":
      return new HttpError(415, "unsupported_charset", "Send the body as UTF-8 (Content-Type: application/json; charset=utf-8)", [
        { field: "(content-type)", rule: "charset", message: "Only UTF-8 is accepted" },
      ]);
    case "encoding.unsupported":
      return new HttpError(415, "unsupported_encoding", "Send the body uncompressed or as gzip, deflate or br", [
        { field: "(content-encoding)", rule: "encoding", message: "Use identity, gzip, deflate or br" },
      ]);
    case "entity.parse.failed":
    case "entity.verify.failed":
      return new HttpError(400, "malformed_json", "The request body is not valid JSON", [
        { field: "(body)", rule: "json", message: "Send a valid JSON document" },
      ]);
    default:
      // Among others a body that does not decompress (gzip or br with junk), which has no type.
      return new HttpError(400, "unreadable_body", "The request body could not be read", [
        { field: "(body)", rule: err.type ?? "encoding", message: "Send the whole body once, as UTF-8 JSON, uncompressed or correctly compressed" },
      ]);
  }
}
