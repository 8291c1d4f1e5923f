import { describe, expect, it } from "vitest";
import { formatStudioInstant, formatStudioRange } from "./format-time.ts";

describe("studio-time formatting (IANA tz database through luxon/Intl)", () => {
  it("shows a UTC instant in Chicago's winter time (UTC−6)", () => {
    expect(formatStudioRange(new Date("2026-12-07T16:00:00Z"), new Date("2026-12-07T19:00:00Z"), "America/Chicago")).toBe("Mon 7 Dec 10:00–13:00");
  });

  it("names the end's day when a session runs past midnight", () => {
    expect(formatStudioRange(new Date("2026-12-08T04:00:00Z"), new Date("2026-12-08T08:00:00Z"), "America/Chicago")).toBe("Mon 7 Dec 22:00–Tue 8 Dec 02:00");
  });

  it("uses summer time (UTC−5) in July", () => {
    expect(formatStudioInstant(new Date("2026-07-01T15:00:00Z"), "America/Chicago")).toBe("Wed 1 Jul 2026, 10:00");
  });
});
