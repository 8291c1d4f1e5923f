import { z } from "zod";
import { idParams } from "./common.ts";
import { defineRoute } from "./route.ts";
import { clockInInput, decideEditInput, editsQuery, proposeEditInput, timeClockDto, timeEntryDto, timeEntryEditDto, timesheetQuery } from "./time.ts";

const clockUsers = ["engineer", "manager", "owner"] as const;
const timeReaders = ["owner", "manager", "bookkeeper", "engineer"] as const;

/** The time clock, timesheets and corrections, declared once for the API and the web. */
export const timeClockRoutes = {
  clock: defineRoute({ method: "get", path: "/api/time-clock", summary: "My clock: the open entry, sessions now, the week so far", access: clockUsers, response: timeClockDto }),
  clockIn: defineRoute({
    method: "post",
    path: "/api/time-clock/clock-in",
    summary: "Clock in, against a session or as shop time (409 when already clocked in)",
    access: clockUsers,
    body: clockInInput,
    status: 201,
    response: timeEntryDto,
  }),
  clockOut: defineRoute({ method: "post", path: "/api/time-clock/clock-out", summary: "Clock out (409 when not clocked in)", access: clockUsers, response: timeEntryDto }),
  breakStart: defineRoute({ method: "post", path: "/api/time-clock/break-start", summary: "Start an unpaid break", access: clockUsers, response: timeEntryDto }),
  breakEnd: defineRoute({ method: "post", path: "/api/time-clock/break-end", summary: "End the break", access: clockUsers, response: timeEntryDto }),
  entries: defineRoute({
    method: "get",
    path: "/api/time-entries",
    summary: "Time entries of a date range; an engineer sees their own",
    access: timeReaders,
    query: timesheetQuery,
    response: z.array(timeEntryDto),
  }),
  edits: defineRoute({
    method: "get",
    path: "/api/time-entry-edits",
    summary: "Corrections proposed to time entries (an engineer sees their own)",
    access: timeReaders,
    query: editsQuery,
    response: z.array(timeEntryEditDto),
  }),
  proposeEdit: defineRoute({
    method: "post",
    path: "/api/time-entry-edits",
    summary: "Propose a correction (or a missing entry) with a reason",
    access: clockUsers,
    body: proposeEditInput,
    status: 201,
    response: timeEntryEditDto,
  }),
  approveEdit: defineRoute({
    method: "post",
    path: "/api/time-entry-edits/:id/approve",
    summary: "Approve a correction: the entry changes, audited before and after",
    access: ["owner", "manager"],
    params: idParams,
    body: decideEditInput,
    response: timeEntryEditDto,
  }),
  rejectEdit: defineRoute({
    method: "post",
    path: "/api/time-entry-edits/:id/reject",
    summary: "Reject a correction",
    access: ["owner", "manager"],
    params: idParams,
    body: decideEditInput,
    response: timeEntryEditDto,
  }),
};
