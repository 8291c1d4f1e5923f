import type { ConflictDto } from "@takeup/domain";
import { formatTimeRange, studioParts } from "../../../lib/studio-time.ts";

/**
 * "Room A is booked 10:00–13:00 by Copper Vale". Holds read "held"; a client asking is not
 * told whose booking it is. The day is named when it is not the day being quoted.
 */
export function describeConflict(conflict: ConflictDto, timeZone: string, onDate?: string): string {
  const sameDay = onDate !== undefined && studioParts(conflict.startsAt, timeZone).date === onDate;
  const when = formatTimeRange(conflict.startsAt, conflict.endsAt, timeZone, { withDay: !sameDay });
  const verb = conflict.status === "hold" ? "held" : conflict.status === "in_session" ? "in session" : "booked";
  return `${conflict.name} is ${verb} ${when}${conflict.clientName ? ` by ${conflict.clientName}` : ""}`;
}
