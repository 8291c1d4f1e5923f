import { z } from "zod";
import { clockInInput, decideEditInput, editsQuery, idParams, proposeEditInput, timeClockDto, timeEntryDto, timeEntryEditDto, timesheetQuery } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { HttpError } from "../../lib/http-error.ts";
import type { Deps } from "../../deps.ts";
import { clockIn, clockOut, clockState, listEntries, toggleBreak } from "./time-clock.service.ts";
import { decideEdit, listEdits, proposeEdit } from "./edits.service.ts";

const clockUsers = ["engineer", "manager", "owner"] as const;

export function timeClockRouter({ db }: Deps) {
  return new ApiRouter("/api/time-clock", "Time clock")
    .route({ method: "get", path: "/", summary: "My clock: the open entry, sessions now, the week so far", access: clockUsers, response: timeClockDto, handler: ({ actor }) => clockState(db, actor) })
    .route({ method: "post", path: "/clock-in", summary: "Clock in, against a session or as shop time (409 when already clocked in)", access: clockUsers, body: clockInInput, status: 201, response: timeEntryDto, handler: ({ actor, body }) => clockIn(db, actor, body.bookingId) })
    .route({ method: "post", path: "/clock-out", summary: "Clock out (409 when not clocked in)", access: clockUsers, response: timeEntryDto, handler: ({ actor }) => clockOut(db, actor) })
    .route({ method: "post", path: "/break-start", summary: "Start an unpaid break", access: clockUsers, response: timeEntryDto, handler: ({ actor }) => toggleBreak(db, actor, "start") })
    .route({ method: "post", path: "/break-end", summary: "End the break", access: clockUsers, response: timeEntryDto, handler: ({ actor }) => toggleBreak(db, actor, "end") });
}

export function timeEntriesRouter({ db }: Deps) {
  return new ApiRouter("/api/time-entries", "Time clock").route({
    method: "get",
    path: "/",
    summary: "Time entries of a date range; an engineer sees their own",
    access: ["owner", "manager", "bookkeeper", "engineer"],
    query: timesheetQuery,
    response: z.array(timeEntryDto),
    handler: ({ actor, query }) => {
      if (actor.role === "engineer" && query.staffUserId && query.staffUserId !== actor.userId) throw new HttpError(403, "forbidden", "An engineer sees their own timesheet only");
      return listEntries(db, query.from, query.to, actor.role === "engineer" ? actor.userId : query.staffUserId);
    },
  });
}

export function timeEditsRouter({ db }: Deps) {
  return new ApiRouter("/api/time-entry-edits", "Time clock")
    .route({ method: "get", path: "/", summary: "Corrections proposed to time entries (an engineer sees their own)", access: ["owner", "manager", "bookkeeper", "engineer"], query: editsQuery, response: z.array(timeEntryEditDto), handler: ({ actor, query }) => listEdits(db, actor, query.status) })
    .route({ method: "post", path: "/", summary: "Propose a correction (or a missing entry) with a reason", access: ["engineer", "manager", "owner"], body: proposeEditInput, status: 201, response: timeEntryEditDto, handler: ({ actor, body }) => proposeEdit(db, actor, body) })
    .route({ method: "post", path: "/:id/approve", summary: "Approve a correction: the entry changes, audited before and after", access: ["owner", "manager"], params: idParams, body: decideEditInput, response: timeEntryEditDto, handler: ({ actor, params, body }) => decideEdit(db, actor, params.id, "approved", body.note) })
    .route({ method: "post", path: "/:id/reject", summary: "Reject a correction", access: ["owner", "manager"], params: idParams, body: decideEditInput, response: timeEntryEditDto, handler: ({ actor, params, body }) => decideEdit(db, actor, params.id, "rejected", body.note) });
}
