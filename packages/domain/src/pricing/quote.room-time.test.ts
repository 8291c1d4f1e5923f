import { describe, expect, it } from "vitest";
import { quote } from "./quote.ts";
import { summary } from "./testing/summary.ts";
import { booking, roomA, roomB, roomC, wrenfield } from "./testing/wrenfield.ts";

// Monday 7 December 2026 is an ordinary weekday at Wrenfield Sound, 08:00–22:00 is daytime.
const roomAOn = (from: string, to: string) => quote(roomA, booking(from, to), wrenfield);

describe("room time at Wrenfield Sound's Room A ($95.00/h, $850.00 for a 10-hour day)", () => {
  it("bills 3 h on a weekday afternoon at the hourly rate: 3 × $95.00 = $285.00 ([D] derived from the demo rate card)", () => {
    const result = roomAOn("2026-12-07T10:00", "2026-12-07T13:00");
    expect(summary(result)).toEqual([["room_hourly", 180, 28500]]);
    expect(result.totalCents).toBe(28500);
    expect(result.lines[0]?.explanation).toBe("Mon 7 Dec: 3 h at $95.00/h (cheaper than the $850.00 day rate).");
    expect(result.rateCardLabel).toBe("Room A rate card v1");
  });

  it("raises a 2 h session to the 3 h minimum: $190.00 + $95.00 top-up = $285.00 ([P] common practice: minimum booking; [D] amounts)", () => {
    const result = roomAOn("2026-12-07T10:00", "2026-12-07T12:00");
    expect(summary(result)).toEqual([["room_hourly", 120, 19000], ["minimum_top_up", 60, 9500]]);
    expect(result.billableMinutes).toBe(180);
    expect(result.totalCents).toBe(28500);
    expect(result.lines[1]?.explanation).toBe("The minimum booking is 3 h: 2 h booked, so 1 h added at $95.00/h.");
  });

  it("rounds 2 h 10 min up to 2 h 30 min, then tops up to the 3 h minimum: $237.50 + $47.50 = $285.00 ([P] common practice: started increments billed; [D] amounts)", () => {
    const result = roomAOn("2026-12-07T10:00", "2026-12-07T12:10");
    expect(summary(result)).toEqual([["room_hourly", 150, 23750], ["minimum_top_up", 30, 4750]]);
    expect(result.elapsedMinutes).toBe(130);
    expect(result.billableMinutes).toBe(180);
    expect(result.lines[0]?.explanation).toBe("Mon 7 Dec: 2 h 30 min (2 h 10 min booked; the booking rounds up to the next 30 min) at $95.00/h (cheaper than the $850.00 day rate).");
  });

  it("keeps 8 h hourly because 8 × $95.00 = $760.00 is under the day rate ([D] lockout cap)", () => {
    expect(summary(roomAOn("2026-12-07T09:00", "2026-12-07T17:00"))).toEqual([["room_hourly", 480, 76000]]);
  });

  it("caps 9 h at the day rate because 9 × $95.00 = $855.00 is more than $850.00 ([D] lockout cap)", () => {
    const result = roomAOn("2026-12-07T09:00", "2026-12-07T18:00");
    expect(summary(result)).toEqual([["room_day", 1, 85000]]);
    expect(result.lines[0]?.explanation).toBe("Mon 7 Dec: 9 h at the day rate ($850.00, cheaper than 9 h × $95.00 = $855.00).");
  });

  it("bills 10 h at the day rate too, so 9 h and 10 h both cost $850.00 ([D] lockout cap)", () => {
    expect(roomAOn("2026-12-07T09:00", "2026-12-07T19:00").totalCents).toBe(85000);
  });

  it("bills 11 h as the day rate plus 1 h beyond the day: $850.00 + $95.00 = $945.00 ([D] hours beyond the day are hourly)", () => {
    const result = roomAOn("2026-12-07T09:00", "2026-12-07T20:00");
    expect(summary(result)).toEqual([["room_day", 1, 85000], ["room_hourly", 60, 9500]]);
    expect(result.totalCents).toBe(94500);
    expect(result.lines[0]?.explanation).toBe("Mon 7 Dec: 11 h — first 10 h at the day rate ($850.00, cheaper than 10 h × $95.00 = $950.00), 1 h beyond the day at $95.00/h.");
  });
});

describe("lockouts over several days", () => {
  it("prices a three-day lockout, Mon–Wed 10:00–20:00 each day, at three day rates: $2,550.00 ([D] 3 × $850.00)", () => {
    const days = ["2026-12-07", "2026-12-08", "2026-12-09"].map((date) => roomAOn(`${date}T10:00`, `${date}T20:00`));
    expect(days.map((day) => summary(day))).toEqual([[["room_day", 1, 85000]], [["room_day", 1, 85000]], [["room_day", 1, 85000]]]);
    expect(days.reduce((sum, day) => sum + day.totalCents, 0)).toBe(255000);
  });

  it("bills the nights when the same three days are one continuous booking, Mon 10:00 to Wed 20:00: $5,685.00 ([D] per-day cap, hours beyond hourly, 20 h after hours at $23.75)", () => {
    const result = roomAOn("2026-12-07T10:00", "2026-12-09T20:00");
    expect(summary(result)).toEqual([
      ["room_day", 1, 85000], ["room_hourly", 240, 38000], // Mon 10:00–24:00: 14 h
      ["room_day", 1, 85000], ["room_hourly", 840, 133000], // Tue: 24 h
      ["room_day", 1, 85000], ["room_hourly", 600, 95000], // Wed 00:00–20:00: 20 h
      ["after_hours_premium", 1200, 47500],
    ]);
    expect(result.totalCents).toBe(568500);
  });
});

describe("sessions that cross midnight", () => {
  it("splits Tue 20:00 to Wed 02:00 into two studio days, 4 h and 2 h, with 4 h after hours: $665.00 ([D] per-day billing)", () => {
    const result = roomAOn("2026-12-08T20:00", "2026-12-09T02:00");
    expect(summary(result)).toEqual([["room_hourly", 240, 38000], ["room_hourly", 120, 19000], ["after_hours_premium", 240, 9500]]);
    expect(result.lines.map((line) => line.date)).toEqual(["2026-12-08", "2026-12-09", undefined]);
    expect(result.totalCents).toBe(66500);
  });

  it("rounds the whole overnight booking once and puts the extra minutes on the last day: 2 h 50 min → 3 h ([D] documented multi-day rule)", () => {
    const result = roomAOn("2026-12-08T22:00", "2026-12-09T00:50");
    // Premium: 170 min × $95.00/h × 25% = 6729.17 cents, rounded half up.
    expect(summary(result)).toEqual([["room_hourly", 120, 19000], ["room_hourly", 60, 9500], ["after_hours_premium", 170, 6729]]);
    expect(result.totalCents).toBe(35229);
  });

  it("applies the day cap to each studio day separately: Mon 14:00 to Tue 08:00 is 10 h and 8 h, not one 18 h day ([D] per-day cap)", () => {
    const result = roomAOn("2026-12-07T14:00", "2026-12-08T08:00");
    expect(summary(result).slice(0, 2)).toEqual([["room_day", 1, 85000], ["room_hourly", 480, 76000]]);
  });
});

describe("the other rooms", () => {
  it("caps Room B at $450.00 for 9 h, where 9 × $55.00 = $495.00 ([D] demo rate card)", () => {
    expect(quote(roomB, booking("2026-12-07T09:00", "2026-12-07T18:00"), wrenfield).totalCents).toBe(45000);
  });

  it("bills Room C $560.00 for 8 h and caps 9 h at $600.00, where 9 × $70.00 = $630.00 ([D] demo rate card)", () => {
    expect(quote(roomC, booking("2026-12-07T09:00", "2026-12-07T17:00"), wrenfield).totalCents).toBe(56000);
    expect(quote(roomC, booking("2026-12-07T09:00", "2026-12-07T18:00"), wrenfield).totalCents).toBe(60000);
  });
});
