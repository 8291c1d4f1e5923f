import type { RequestHandler } from "express";
import type { Access } from "@takeup/domain";
import { HttpError } from "../lib/http-error.ts";
import type { SessionReader } from "../lib/session.ts";

export type { Access };

/**
 * The one place access is decided. It resolves the signed-in actor (401 when there is none
 * or the account is deactivated) and refuses roles outside the list with 403.
 */
export function requireRole(sessions: SessionReader, access: Access): RequestHandler {
  return async (req, res, next) => {
    if (access === "public") return next();
    const actor = await sessions.actorFor(req);
    if (!actor) throw new HttpError(401, "signed_out", "Sign in to continue");
    if (access !== "signed-in" && !access.includes(actor.role)) {
      throw new HttpError(403, "forbidden", "Your role does not allow this");
    }
    res.locals.actor = actor;
    next();
  };
}
