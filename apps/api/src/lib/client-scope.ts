import type { Actor } from "./actor.ts";
import { notFound } from "./http-error.ts";

/**
 * A client user sees only its own client account's rows: anything else answers 404 exactly as
 * if it did not exist, so ids of other clients cannot be probed. Staff pass through.
 */
export function assertClientScope(actor: Actor, clientAccountId: number, what = "That client account"): void {
  if (actor.role === "client" && actor.clientAccountId !== clientAccountId) throw notFound(what);
}
