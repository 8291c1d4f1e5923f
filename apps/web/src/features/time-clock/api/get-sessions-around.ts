import { queryOptions, useQuery } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { addDays, studioDayStartIso } from "../../../lib/studio-time.ts";
import { timeClockKeys } from "./time-clock-keys.ts";

export type SessionChoice = { id: number; clientName: string; roomName: string; startsAt: string; endsAt: string };

/**
 * The sessions a person was booked on from the day before `day` to the day after (studio
 * days), for tying a correction or missing time to one. Cancelled bookings are left out.
 */
export async function getSessionsAround(staffUserId: string, day: string, timeZone: string, signal?: AbortSignal): Promise<SessionChoice[]> {
  const query = { from: studioDayStartIso(addDays(day, -1), timeZone), to: studioDayStartIso(addDays(day, 2), timeZone), engineerId: staffUserId };
  const bookings = await callApi(bookingRoutes.list, { query, signal });
  return bookings
    .filter((b) => b.status !== "cancelled" && b.status !== "hold" && b.engineers.some((e) => e.userId === staffUserId))
    .map((b) => ({ id: b.id, clientName: b.client.name, roomName: b.room.name, startsAt: b.startsAt, endsAt: b.endsAt }));
}

export const sessionsAroundQueryOptions = (staffUserId: string, day: string, timeZone: string) =>
  queryOptions({ queryKey: timeClockKeys.sessionsAround(staffUserId, day), queryFn: ({ signal }) => getSessionsAround(staffUserId, day, timeZone, signal) });

export const useSessionsAround = (staffUserId: string, day: string | null, timeZone: string) =>
  useQuery({ ...sessionsAroundQueryOptions(staffUserId, day ?? "", timeZone), enabled: day !== null });
