import type { RequestHandler } from "express";
import { HttpError } from "../lib/http-error.ts";

const safeMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Refuses cross-site writes: a mutating request must come from one of our own origins.
 * A request with neither an Origin header nor a cookie carries no session to abuse.
 */
export function sameOrigin(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const origin = req.headers.origin;
    if (origin ? !allowed.has(origin) : Boolean(req.headers.cookie)) {
      throw new HttpError(403, "cross_site_request", "This request did not come from the Takeup app");
    }
    next();
  };
}
