import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { roundPunch } from "./round-punch.ts";
import { localTime, priya, rate, wrenfield } from "./test-fixtures.ts";
import type { PunchRounding } from "./types.ts";

const zone = wrenfield.timeZone;
const on = (time: string) => localTime(`2026-02-03T${time}`);

/** Paid minutes of an 8:00–17:00 day with a 12:00–13:00 unpaid meal, one punch moved. */
function paidMinutes(inTime: string, outTime: string): number {
  const result = computeOvertime({
    entries: [
      {
        id: "day",
        staffId: priya,
        start: on(inTime),
        end: on(outTime),
        unpaidBreaks: [{ start: on("12:00"), end: on("13:00") }],
        rateCode: "engineer",
      },
    ],
    payRates: [rate(priya, "engineer", 2000)],
    settings: { ...wrenfield, punchRounding: "15" },
  });
  return result.workweeks[0]?.workedMinutes ?? 0;
}

describe("roundPunch on the quarter-hour grid", () => {
  const arizona: [string, string, string, number][] = [
    ["in", "07:55", "08:00", 8],
    ["in", "07:50", "07:45", 8.25],
    ["in", "08:04", "08:00", 8],
    ["in", "08:08", "08:15", 7.75],
    ["out", "16:47", "16:45", 7.75],
    ["out", "17:05", "17:00", 8],
    ["out", "16:55", "17:00", 8],
    ["out", "17:06", "17:00", 8],
    ["out", "17:09", "17:15", 8.25],
  ];

  it.each(arizona)(
    "rounds punch %s %s to %s and pays %d h for the day (29 CFR 785.48(b); Univ. of Arizona, Rounding reported hours) [S]",
    (kind, punched, rounded, paidHours) => {
      expect(roundPunch(on(punched), "15", zone)).toEqual(on(rounded));
      const minutes = kind === "in" ? paidMinutes(punched, "17:00") : paidMinutes("08:00", punched);
      expect(minutes).toBe(paidHours * 60);
    },
  );

  it("rounds 1–7 minutes past the quarter down and 8–14 up (Univ. of Arizona reading of 29 CFR 785.48(b)) [S]", () => {
    for (let m = 1; m <= 14; m += 1) {
      const expected = m <= 7 ? "08:00" : "08:15";
      expect(roundPunch(on(`08:${String(m).padStart(2, "0")}`), "15", zone)).toEqual(on(expected));
    }
  });

  it("leaves a punch already on the grid where it is (29 CFR 785.48(b)) [D]", () => {
    expect(roundPunch(on("08:15"), "15", zone)).toEqual(on("08:15"));
  });
});

describe("roundPunch on other grids", () => {
  it.each([
    ["5", "08:02", "08:00"],
    ["5", "08:03", "08:05"],
    ["6", "08:02", "08:00"],
    ["6", "08:04", "08:06"],
  ] as [PunchRounding, string, string][])(
    "on the %s-minute grid rounds %s to %s (29 CFR 785.48(b), nearest-point rule applied) [D]",
    (grid, punched, rounded) => {
      expect(roundPunch(on(punched), grid, zone)).toEqual(on(rounded));
    },
  );

  it("rounds a punch exactly 7 min 30 s past the quarter hour up, 08:07:30 to 08:15 (University of Kansas HR rounding chart: 7 min 30 sec – 22 min 29 sec → 0.25) [S]", () => {
    expect(roundPunch(on("08:07:30"), "15", zone)).toEqual(on("08:15"));
    // And one second less rounds down: 7 min 29 s is still under the chart's 7 min 30 s.
    expect(roundPunch(on("08:07:29"), "15", zone)).toEqual(on("08:00"));
  });

  it.each([
    ["6", "08:03:00", "08:06"],
    ["5", "08:02:30", "08:05"],
    ["none", "08:00:30", "08:01"],
  ] as [PunchRounding, string, string][])(
    "breaks a tie on the %s grid by rounding %s to the later point, %s (our stated tie policy, the Kansas chart's quarter-hour rule carried to the other grids; 29 CFR 785.48(b) sets none) [D]",
    (grid, punched, rounded) => {
      expect(roundPunch(on(punched), grid, zone)).toEqual(on(rounded));
    },
  );

  it("with no grid still lands on the whole minute, 29 seconds down (our setting; engine counts whole minutes) [P]", () => {
    expect(roundPunch(on("08:00:29.999"), "none", zone)).toEqual(on("08:00"));
  });

  it("lays the grid on local time in a zone 5:45 ahead of UTC, so 8:02 local goes to 8:00 local (29 CFR 785.48(b) applied to the studio's clock) [D]", () => {
    const kathmandu = "Asia/Kathmandu";
    const punched = localTime("2026-02-03T08:02", kathmandu);
    expect(roundPunch(punched, "6", kathmandu)).toEqual(localTime("2026-02-03T08:00", kathmandu));
    // On a UTC grid the same instant (02:17Z) would have gone to 02:18Z, i.e. 8:03 local.
    expect(punched.toISOString()).toBe("2026-02-03T02:17:00.000Z");
  });

  it("rounds both 1:53 punches on the night the clocks go back up by seven real minutes (29 CFR 785.48(b); IANA America/Chicago) [D]", () => {
    const firstPass = new Date("2026-11-01T06:53:00Z"); // 1:53 CDT
    const secondPass = new Date("2026-11-01T07:53:00Z"); // 1:53 CST, an hour later
    expect(roundPunch(firstPass, "15", zone)).toEqual(new Date("2026-11-01T07:00:00Z"));
    expect(roundPunch(secondPass, "15", zone)).toEqual(new Date("2026-11-01T08:00:00Z"));
  });

  it("never moves an earlier punch past a later one, on any grid (our tie policy keeps rounding monotone) [D]", () => {
    const grids: PunchRounding[] = ["none", "5", "6", "15"];
    const base = on("00:00").getTime();
    fc.assert(
      fc.property(
        fc.constantFrom(...grids),
        fc.integer({ min: 0, max: 86_400_000 }),
        fc.integer({ min: 0, max: 3_600_000 }),
        (grid, a, gap) => {
          const earlier = roundPunch(new Date(base + a), grid, zone).getTime();
          const later = roundPunch(new Date(base + a + gap), grid, zone).getTime();
          expect(earlier).toBeLessThanOrEqual(later);
        },
      ),
      { numRuns: 200 },
    );
  });
});
