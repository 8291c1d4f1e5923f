import { describe, expect, it } from "vitest";
import { quote } from "./quote.ts";
import { intlWallClock } from "./testing/intl-clock.ts";
import { summary } from "./testing/summary.ts";
import { booking, roomA, wrenfield } from "./testing/wrenfield.ts";

const chicago = wrenfield.timeZone;

describe("quotes across America/Chicago's 2026 clock changes", () => {
  it("bills 7 elapsed hours, not 8, for Sat 7 Mar 20:00 to Sun 8 Mar 04:00 (IANA tz via Intl: clocks jump 02:00 → 03:00)", () => {
    const night = booking("2026-03-07T20:00", "2026-03-08T04:00");
    // Intl confirms both instants read as the intended wall-clock times.
    expect(intlWallClock(night.startsAt.getTime(), chicago)).toMatchObject({ date: "2026-03-07", minuteOfDay: 20 * 60 });
    expect(intlWallClock(night.endsAt.getTime(), chicago)).toMatchObject({ date: "2026-03-08", minuteOfDay: 4 * 60 });
    const result = quote(roomA, night, wrenfield);
    expect(result.elapsedMinutes).toBe(420);
    // [D] 7 × $95.00; after hours 22:00–04:00 is 5 elapsed hours × $23.75; weekend 7 h × $14.25.
    expect(summary(result)).toEqual([["room_hourly", 240, 38000], ["room_hourly", 180, 28500], ["after_hours_premium", 300, 11875], ["weekend_premium", 420, 9975]]);
    expect(result.totalCents).toBe(88350);
    expect(result.lines[1]?.explanation).toBe("Sun 8 Mar: 3 h at $95.00/h (cheaper than the $850.00 day rate). The clocks went forward during this day, so 00:00–04:00 is 3 h.");
  });

  it("bills 9 elapsed hours for Sat 31 Oct 20:00 to Sun 1 Nov 04:00 (IANA tz via Intl: clocks fall back 02:00 → 01:00)", () => {
    const night = booking("2026-10-31T20:00", "2026-11-01T04:00");
    expect(intlWallClock(night.endsAt.getTime(), chicago)).toMatchObject({ date: "2026-11-01", minuteOfDay: 4 * 60 });
    const result = quote(roomA, night, wrenfield);
    expect(result.elapsedMinutes).toBe(540);
    // [D] 4 h + 5 h hourly (neither studio day reaches the cap); 7 h after hours; 9 h weekend.
    expect(summary(result)).toEqual([["room_hourly", 240, 38000], ["room_hourly", 300, 47500], ["after_hours_premium", 420, 16625], ["weekend_premium", 540, 12825]]);
    expect(result.totalCents).toBe(114950);
  });

  it("bills the 25-hour fall-back Sunday as a day rate plus 15 h beyond it: $2,892.50 ([D] IANA tz via Intl gives the 25 h)", () => {
    const result = quote(roomA, booking("2026-11-01T00:00", "2026-11-02T00:00"), wrenfield);
    expect(result.elapsedMinutes).toBe(1500);
    // After hours: 00:00–08:00 (9 elapsed hours) and 22:00–24:00.
    expect(summary(result)).toEqual([["room_day", 1, 85000], ["room_hourly", 900, 142500], ["after_hours_premium", 660, 26125], ["weekend_premium", 1500, 35625]]);
    expect(result.totalCents).toBe(289250);
  });

  it("bills the 23-hour spring-forward Sunday as a day rate plus 13 h beyond it ([D] IANA tz via Intl gives the 23 h)", () => {
    const result = quote(roomA, booking("2026-03-08T00:00", "2026-03-09T00:00"), wrenfield);
    expect(result.elapsedMinutes).toBe(1380);
    expect(summary(result).slice(0, 3)).toEqual([["room_day", 1, 85000], ["room_hourly", 780, 123500], ["after_hours_premium", 540, 21375]]);
  });
});
