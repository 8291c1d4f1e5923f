import type { Request } from "express";
import { fromNodeHeaders } from "better-auth/node";
import type { Db } from "@takeup/db";
import { loadActor, type Actor } from "./actor.ts";
import type { Auth } from "../auth.ts";

export type SessionReader = { actorFor(req: Request): Promise<Actor | null> };

/** Reads the better-auth session cookie and resolves it to an active actor, once per request. */
export function createSessionReader(auth: Auth, db: Db): SessionReader {
  const cache = new WeakMap<Request, Promise<Actor | null>>();
  const resolve = async (req: Request) => {
    const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    if (!session) return null;
    const actor = await loadActor(db, session.user.id);
    return actor?.active ? actor : null;
  };
  return {
    actorFor(req) {
      let pending = cache.get(req);
      if (!pending) {
        pending = resolve(req);
        cache.set(req, pending);
      }
      return pending;
    },
  };
}
