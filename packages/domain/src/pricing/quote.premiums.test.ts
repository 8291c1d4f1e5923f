import { describe, expect, it } from "vitest";
import { quote } from "./quote.ts";
import { summary } from "./testing/summary.ts";
import { booking, roomA, wrenfield } from "./testing/wrenfield.ts";

// Room A: $95.00/h, after hours 22:00–08:00 +25% ($23.75/h), weekends +15% ($14.25/h).
const roomAOn = (from: string, to: string) => quote(roomA, booking(from, to), wrenfield);

describe("after-hours and weekend premiums", () => {
  it("charges an evening 20:00–00:00 on a Monday 4 h of room time and 2 h after hours: $380.00 + $47.50 = $427.50 ([D] 2 × 25% × $95.00)", () => {
    const result = roomAOn("2026-12-07T20:00", "2026-12-08T00:00");
    expect(summary(result)).toEqual([["room_hourly", 240, 38000], ["after_hours_premium", 120, 4750]]);
    expect(result.totalCents).toBe(42750);
    expect(result.lines[1]?.unitAmountCents).toBe(2375);
    expect(result.lines[1]?.explanation).toBe("25% of the hourly rate ($95.00/h) on 2 h after hours (22:00–08:00): Mon 7 Dec 22:00–24:00.");
  });

  it("rounds a half cent up, not to even: 30 min after hours at $93/h × 25% = 1162.5 ¢ is charged $11.63, where half-to-even would give $11.62 ([D] our documented half-up rule)", () => {
    const card = { ...roomA, id: "room-93", hourlyRateCents: 9300, dayRateCents: 93_000 };
    const result = quote(card, booking("2026-12-07T19:00", "2026-12-07T22:30"), wrenfield);
    // 3.5 h × $93.00 = $325.50; 0.5 h × $93.00 × 25% = $11.625 → $11.63.
    expect(summary(result)).toEqual([["room_hourly", 210, 32550], ["after_hours_premium", 30, 1163]]);
    expect(result.totalCents).toBe(33713);
  });

  it("charges a Saturday session 12:00–17:00 the weekend premium on all 5 h: $475.00 + $71.25 = $546.25 ([D] 5 × 15% × $95.00)", () => {
    const result = roomAOn("2026-12-12T12:00", "2026-12-12T17:00");
    expect(summary(result)).toEqual([["room_hourly", 300, 47500], ["weekend_premium", 300, 7125]]);
    expect(result.totalCents).toBe(54625);
    expect(result.lines[1]?.explanation).toBe("15% of the hourly rate ($95.00/h) on 5 h on a Saturday or Sunday: Sat 12 Dec 12:00–17:00.");
  });

  it("adds both premiums on a Saturday night past 22:00, so those hours carry 40%, not 43.75%: 18:00–24:00 costs $703.00 ([D] documented additive rule)", () => {
    const result = roomAOn("2026-12-12T18:00", "2026-12-13T00:00");
    expect(summary(result)).toEqual([["room_hourly", 360, 57000], ["after_hours_premium", 120, 4750], ["weekend_premium", 360, 8550]]);
    expect(result.totalCents).toBe(70300);
  });

  it("starts the weekend at local midnight: Fri 21:00 to Sat 01:00 has 3 h after hours and 1 h of weekend: $465.50 ([D] Saturday in the studio's zone)", () => {
    const result = roomAOn("2026-12-11T21:00", "2026-12-12T01:00");
    expect(summary(result)).toEqual([["room_hourly", 180, 28500], ["room_hourly", 60, 9500], ["after_hours_premium", 180, 7125], ["weekend_premium", 60, 1425]]);
    expect(result.totalCents).toBe(46550);
  });

  it("charges the weekend premium on the hourly value even on a day-rate Saturday: 10 h costs $850.00 + $142.50 ([D] documented rule)", () => {
    const result = roomAOn("2026-12-12T09:00", "2026-12-12T19:00");
    expect(summary(result)).toEqual([["room_day", 1, 85000], ["weekend_premium", 600, 14250]]);
  });

  it("keeps a longer day from costing less: 06:00–15:00 and 06:00–16:00 both cost $897.50, where premiums on a share of the day rate would give $897.22 and $892.50 ([D] documented rule)", () => {
    expect(roomAOn("2026-12-07T06:00", "2026-12-07T15:00").totalCents).toBe(89750);
    expect(roomAOn("2026-12-07T06:00", "2026-12-07T16:00").totalCents).toBe(89750);
  });

  it("charges no premium on minutes added by rounding or the minimum: 23:00–00:10 bills 3 h of room but 70 min after hours ([D] documented rule)", () => {
    const result = roomAOn("2026-12-07T23:00", "2026-12-08T00:10");
    // 70 min × $95.00/h × 25% = 2770.83 cents, rounded half up.
    expect(summary(result)).toEqual([["room_hourly", 60, 9500], ["room_hourly", 30, 4750], ["minimum_top_up", 90, 14250], ["after_hours_premium", 70, 2771]]);
    expect(result.totalCents).toBe(31271);
  });

  it("rounds a half-cent premium up: 30 min after hours is 1187.5 cents, billed $11.88 ([P] common practice: round half up per line)", () => {
    const result = roomAOn("2026-12-07T19:30", "2026-12-07T22:30");
    expect(summary(result)).toEqual([["room_hourly", 180, 28500], ["after_hours_premium", 30, 1188]]);
  });

  it("counts the morning end of the window too: 06:00–10:00 has 2 h after hours ([D] window 22:00–08:00 wraps midnight)", () => {
    expect(summary(roomAOn("2026-12-07T06:00", "2026-12-07T10:00"))).toEqual([["room_hourly", 240, 38000], ["after_hours_premium", 120, 4750]]);
  });

  it("leaves premium lines out when a rate card has no window and no weekend premium", () => {
    const plain = { ...roomA, afterHours: { startMinute: 0, endMinute: 0 }, weekendPremiumBp: 0 };
    expect(summary(quote(plain, booking("2026-12-12T20:00", "2026-12-13T02:00"), wrenfield)).map(([kind]) => kind)).toEqual(["room_hourly", "room_hourly"]);
  });
});
