import { timeClockRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { HttpError } from "../../lib/http-error.ts";
import type { Deps } from "../../deps.ts";
import { clockIn, clockOut, clockState, listEntries, toggleBreak } from "./time-clock.service.ts";
import { decideEdit, listEdits, proposeEdit } from "./edits.service.ts";

export function timeClockRouter({ db }: Deps) {
  return new ApiRouter("/api/time-clock", "Time clock")
    .handle(timeClockRoutes.clock, ({ actor }) => clockState(db, actor))
    .handle(timeClockRoutes.clockIn, ({ actor, body }) => clockIn(db, actor, body.bookingId))
    .handle(timeClockRoutes.clockOut, ({ actor }) => clockOut(db, actor))
    .handle(timeClockRoutes.breakStart, ({ actor }) => toggleBreak(db, actor, "start"))
    .handle(timeClockRoutes.breakEnd, ({ actor }) => toggleBreak(db, actor, "end"));
}

export function timeEntriesRouter({ db }: Deps) {
  return new ApiRouter("/api/time-entries", "Time clock").handle(timeClockRoutes.entries, ({ actor, query }) => {
    if (actor.role === "engineer" && query.staffUserId && query.staffUserId !== actor.userId) throw new HttpError(403, "forbidden", "An engineer sees their own timesheet only");
    return listEntries(db, query.from, query.to, actor.role === "engineer" ? actor.userId : query.staffUserId);
  });
}

export function timeEditsRouter({ db }: Deps) {
  return new ApiRouter("/api/time-entry-edits", "Time clock")
    .handle(timeClockRoutes.edits, ({ actor, query }) => listEdits(db, actor, query.status))
    .handle(timeClockRoutes.proposeEdit, ({ actor, body }) => proposeEdit(db, actor, body))
    .handle(timeClockRoutes.approveEdit, ({ actor, params, body }) => decideEdit(db, actor, params.id, "approved", body.note))
    .handle(timeClockRoutes.rejectEdit, ({ actor, params, body }) => decideEdit(db, actor, params.id, "rejected", body.note));
}
