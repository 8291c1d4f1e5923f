import { describe, expect, it } from "vitest";
import { engineerRateCents } from "./engineer-charges.ts";
import { quote } from "./quote.ts";
import { summary } from "./testing/summary.ts";
import { assistant, booking, houseEngineer, roomA, wrenfield } from "./testing/wrenfield.ts";

// Wrenfield bills its house engineer at $40.00/h and (our demo choice) an assistant at $25.00/h.
describe("engineer time", () => {
  it("adds one engineer at $40.00/h to a 3 h session: $285.00 + $120.00 = $405.00 ([D] demo rates)", () => {
    const result = quote(roomA, booking("2026-12-07T10:00", "2026-12-07T13:00", [houseEngineer]), wrenfield);
    expect(summary(result)).toEqual([["room_hourly", 180, 28500], ["engineer", 180, 12000]]);
    expect(result.totalCents).toBe(40500);
    expect(result.lines[1]).toMatchObject({ label: "Engineer: Tamsin Greaves", engineerId: "eng-1", explanation: "Tamsin Greaves (engineer): 3 h at $40.00/h." });
  });

  it("adds an engineer and an assistant to a 3 h session: $285.00 + $120.00 + $75.00 = $480.00 ([D] demo rates)", () => {
    const result = quote(roomA, booking("2026-12-07T10:00", "2026-12-07T13:00", [houseEngineer, assistant]), wrenfield);
    expect(summary(result)).toEqual([["room_hourly", 180, 28500], ["engineer", 180, 12000], ["engineer", 180, 7500]]);
    expect(result.totalCents).toBe(48000);
    expect(result.lines[2]?.label).toBe("Assistant engineer: Rory Allard");
  });

  it("rounds engineer time like room time but does not apply the room's minimum: 2 h 10 min bills each engineer 2 h 30 min ([D] documented rule)", () => {
    const result = quote(roomA, booking("2026-12-07T10:00", "2026-12-07T12:10", [houseEngineer, assistant]), wrenfield);
    expect(summary(result)).toEqual([["room_hourly", 150, 23750], ["minimum_top_up", 30, 4750], ["engineer", 150, 10000], ["engineer", 150, 6250]]);
    expect(result.totalCents).toBe(44750);
  });

  it("never caps engineer time at a day rate: 11 h with an engineer costs $945.00 + $440.00 ([D] documented rule)", () => {
    expect(quote(roomA, booking("2026-12-07T09:00", "2026-12-07T20:00", [houseEngineer]), wrenfield).totalCents).toBe(138500);
  });

  it("charges no premium on engineer time: a Saturday night engineer stays at $40.00/h ([D] documented rule)", () => {
    const result = quote(roomA, booking("2026-12-12T20:00", "2026-12-13T00:00", [houseEngineer]), wrenfield);
    expect(result.lines.filter((line) => line.kind === "engineer").map((line) => line.amountCents)).toEqual([16000]);
  });

  it("prefers a rate agreed for the booking, then the rate card's rate for the person, then the grade's rate", () => {
    const card = { ...roomA, engineerRates: { ...roomA.engineerRates, perEngineerCents: { "eng-1": 4500 } } };
    expect(engineerRateCents(houseEngineer, roomA)).toBe(4000);
    expect(engineerRateCents(houseEngineer, card)).toBe(4500);
    expect(engineerRateCents({ ...houseEngineer, rateCentsOverride: 3500 }, card)).toBe(3500);
    expect(engineerRateCents(assistant, card)).toBe(2500);
  });
});
