import { DateTime } from "luxon";
import type { AssignedEngineer, Booking, RateCard, Studio } from "../types.ts";

/**
 * Wrenfield Sound, the invented studio of the demo. Its rates are the product brief's demo
 * values; where the brief names a figure for Room A only (10-hour day, 3 h minimum, 30-minute
 * steps) Rooms B and C use the same, and the assistant rate ($25/h) is our own demo choice.
 */
export const wrenfield: Studio = { timeZone: "America/Chicago", currency: "USD" };

const shared = {
  dayCoversMinutes: 600,
  minimumBillableMinutes: 180,
  billingIncrementMinutes: 30,
  afterHours: { startMinute: 22 * 60, endMinute: 8 * 60 },
  afterHoursPremiumBp: 2500,
  weekendPremiumBp: 1500,
  engineerRates: { engineer: 4000, assistant: 2500 },
};

export const roomA: RateCard = { ...shared, id: "room-a-v1", label: "Room A rate card v1", hourlyRateCents: 9500, dayRateCents: 85000 };
export const roomB: RateCard = { ...shared, id: "room-b-v1", label: "Room B rate card v1", hourlyRateCents: 5500, dayRateCents: 45000 };
export const roomC: RateCard = { ...shared, id: "room-c-v1", label: "Room C rate card v1", hourlyRateCents: 7000, dayRateCents: 60000 };

export const houseEngineer: AssignedEngineer = { id: "eng-1", name: "Tamsin Greaves", grade: "engineer" };
export const assistant: AssignedEngineer = { id: "eng-2", name: "Rory Allard", grade: "assistant" };

/** A Wrenfield wall-clock time ("2026-12-07T10:00") as an instant. */
export function local(wallClock: string): Date {
  const instant = DateTime.fromISO(wallClock, { zone: wrenfield.timeZone });
  if (!instant.isValid) throw new RangeError(`Bad wall-clock time ${wallClock}`);
  return instant.toJSDate();
}

export function booking(from: string, to: string, engineers: AssignedEngineer[] = []): Booking {
  return { startsAt: local(from), endsAt: local(to), engineers };
}
