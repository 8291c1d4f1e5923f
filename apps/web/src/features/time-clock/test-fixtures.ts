import type { TimeClockDto, TimeEntryDto, TimeEntryEditDto } from "@takeup/domain";

// Wrenfield Sound (America/Chicago, −06:00 in December). Monday 7 December 2026 is the example day.

export const entry = (over: Partial<TimeEntryDto> = {}): TimeEntryDto => ({
  id: 501,
  staffUserId: "u-priya",
  staffName: "Priya Oduya",
  booking: { id: 12, roomName: "Room A", clientName: "Lantern Static" },
  kind: "session",
  payRateCode: "engineer",
  // 09:58–18:30 Chicago, with a 30-minute break at 13:00.
  startedAt: "2026-12-07T15:58:00.000Z",
  endedAt: "2026-12-08T00:30:00.000Z",
  source: "clock",
  note: null,
  breaks: [{ id: 71, startedAt: "2026-12-07T19:00:00.000Z", endedAt: "2026-12-07T19:30:00.000Z" }],
  workedMinutes: 482,
  flags: [],
  ...over,
});

export const week = (over: Partial<TimeClockDto["week"]> = {}): TimeClockDto["week"] => ({
  workweekStart: "2026-12-07",
  workedMinutes: 482 + 372,
  days: [
    { date: "2026-12-07", workedMinutes: 482 },
    { date: "2026-12-08", workedMinutes: 372 },
    { date: "2026-12-09", workedMinutes: 0 },
    { date: "2026-12-10", workedMinutes: 0 },
    { date: "2026-12-11", workedMinutes: 0 },
    { date: "2026-12-12", workedMinutes: 0 },
    { date: "2026-12-13", workedMinutes: 0 },
  ],
  ...over,
});

export const lanternStaticNow = {
  id: 12,
  roomName: "Room A",
  clientName: "Lantern Static",
  // 10:00–20:00 Chicago.
  startsAt: "2026-12-08T16:00:00.000Z",
  endsAt: "2026-12-09T02:00:00.000Z",
  title: "Vocal overdubs",
};

export const copperValeNow = {
  id: 14,
  roomName: "Room C",
  clientName: "Copper Vale",
  startsAt: "2026-12-08T17:00:00.000Z",
  endsAt: "2026-12-08T21:00:00.000Z",
  title: null,
};

export const clockState = (over: Partial<TimeClockDto> = {}): TimeClockDto => ({
  openEntry: null,
  onBreak: false,
  sessionsNow: [],
  week: week(),
  ...over,
});

export const edit = (over: Partial<TimeEntryEditDto> = {}): TimeEntryEditDto => ({
  id: 31,
  timeEntryId: 501,
  staffUserId: "u-priya",
  staffName: "Priya Oduya",
  // Proposed: in at 09:30 instead of 09:58.
  proposed: {
    startedAt: "2026-12-07T15:30:00.000Z",
    endedAt: "2026-12-08T00:30:00.000Z",
    breaks: [{ startedAt: "2026-12-07T19:00:00.000Z", endedAt: "2026-12-07T19:30:00.000Z" }],
    bookingId: 12,
  },
  current: {
    startedAt: "2026-12-07T15:58:00.000Z",
    endedAt: "2026-12-08T00:30:00.000Z",
    breaks: [{ startedAt: "2026-12-07T19:00:00.000Z", endedAt: "2026-12-07T19:30:00.000Z" }],
  },
  reason: "Started the mic setup before clocking in",
  status: "pending",
  proposedByName: "Priya Oduya",
  approvalRule: "may_approve",
  selfApproved: false,
  decidedByName: null,
  decidedAt: null,
  decisionNote: null,
  createdAt: "2026-12-08T15:00:00.000Z",
  ...over,
});
