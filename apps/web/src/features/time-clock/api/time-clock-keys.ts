export type TimeEntriesParams = { from: string; to: string; staffUserId?: string };
export type TimeEntryEditsParams = { status?: "pending" | "approved" | "rejected" };

export const timeClockKeys = {
  all: ["time-clock"] as const,
  clock: () => [...timeClockKeys.all, "clock"] as const,
  entries: () => [...timeClockKeys.all, "entries"] as const,
  entryList: (params: TimeEntriesParams) => [...timeClockKeys.entries(), params] as const,
  edits: () => [...timeClockKeys.all, "edits"] as const,
  editList: (params: TimeEntryEditsParams) => [...timeClockKeys.edits(), params] as const,
  sessionsAround: (staffUserId: string, day: string) => [...timeClockKeys.all, "sessions", staffUserId, day] as const,
};
