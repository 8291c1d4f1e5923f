import type { ErrorRequestHandler, RequestHandler } from "express";
import { ZodError } from "zod";
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

/** Renders every error as {"error":{code,message,details?}}; internals never leave the server. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return res.end();
    let error: HttpError;
    if (err instanceof HttpError) {
      error = err;
    } else if (err instanceof ZodError) {
      const details = zodDetails(err);
      const summary = details.map((d) => `${d.field}: ${d.message}`).join("; ");
      error = new HttpError(400, "invalid_input", `Check the request: ${summary}`, details);
    } else if (isBodyParserError(err)) {
      error =
        err.type === "entity.too.large"
          ? new HttpError(413, "body_too_large", "The request body is too large")
          : new HttpError(400, "malformed_json", "The request body is not valid JSON", [
              { field: "(body)", rule: "json", message: "Send a valid JSON document" },
            ]);
    } else {
      logger.error("unhandled error", {
        method: req.method,
        path: req.originalUrl,
        error: err instanceof Error ? { name: err.name, message: err.message, stack: err.stack } : String(err),
      });
      error = new HttpError(500, "internal_error", "Something went wrong on our side; it has been logged");
    }
    res.status(error.status).json({
      error: { code: error.code, message: error.message, ...(error.details ? { details: error.details } : {}) },
    });
  };
}

function isBodyParserError(err: unknown): err is { type: string; status: number } {
  return typeof err === "object" && err !== null && "type" in err && typeof err.type === "string" && err.type.startsWith("entity.");
}
