import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { feetFor, planTape, reelMinutes, TapePlanError, usableMinutes } from "./planner.ts";

describe("minutes of tape per reel (REFERENCES.md, tape length and recording time [S, physics]: minutes = feet ÷ (5 × in/s))", () => {
  // [S] the tape-time table in REFERENCES.md, each row at 3¾, 7½, 15 and 30 in/s.
  const table: [number, [number, number, number, number]][] = [
    [1200, [64, 32, 16, 8]],
    [1800, [96, 48, 24, 12]],
    [2400, [128, 64, 32, 16]],
    [2500, [400 / 3, 200 / 3, 100 / 3, 50 / 3]],
    [3600, [192, 96, 48, 24]],
  ];
  for (const [feet, minutes] of table) {
    it(`runs ${feet} ft for ${minutes.map((m) => Math.round(m * 100) / 100).join(" / ")} minutes at 3¾ / 7½ / 15 / 30 in/s ([S] table row)`, () => {
      [3.75, 7.5, 15, 30].forEach((speed, i) => expect(reelMinutes(feet, speed)).toBeCloseTo(minutes[i]!, 10));
    });
  }

  it("uses 281.25 ft for a C60 cassette side of 30 minutes at 1⅞ in/s ([S] cassette check)", () => {
    expect(feetFor(30, 1.875)).toBe(281.25);
    expect(reelMinutes(281.25, 1.875)).toBe(30);
  });

  it("holds a little over half an hour on a full 10½-inch reel of 2500 ft at 15 in/s ([P] common practice)", () => {
    const minutes = reelMinutes(2500, 15);
    expect(minutes).toBeGreaterThan(30);
    expect(minutes).toBeLessThan(35);
  });

  it("doubles the time per reel at 7½ in/s and halves it at 30 ([S] each step halves or doubles)", () => {
    expect(reelMinutes(2500, 7.5)).toBeCloseTo(2 * reelMinutes(2500, 15), 10);
    expect(reelMinutes(2500, 30)).toBeCloseTo(reelMinutes(2500, 15) / 2, 10);
  });

  it("takes the head-and-tail allowance (default one minute) off each reel", () => {
    expect(usableMinutes(2400, 15)).toBe(31);
    expect(usableMinutes(2400, 15, 2.5)).toBe(29.5);
  });
});

describe("laying takes out on reels", () => {
  it("lays an album of ten songs × three takes at 15 in/s on 2500 ft reels with no take split", () => {
    const songs = Array.from({ length: 10 }, (_, i) => ({ title: `Track ${i + 1}`, minutes: 3 + (i % 4) * 0.5, takes: 3 }));
    const plan = planTape({ songs, speedIps: 15, reelLengthFt: 2500 });
    expect(plan.minutesPerReel).toBeCloseTo(32.33, 2);
    expect(plan.totalMinutes).toBe(3 * songs.reduce((s, x) => s + x.minutes, 0));
    expect(plan.reelsNeeded).toBe(Math.ceil(plan.totalMinutes / (100 / 3 - 1)));
    expect(plan.alternatives.map((a) => a.speedIps)).toEqual([7.5, 30]);
    const at75 = plan.alternatives.find((a) => a.speedIps === 7.5)!;
    expect(at75.reelsNeeded).toBeLessThan(plan.reelsNeeded);
  });

  it("refuses a take longer than a reel, naming the song", () => {
    const attempt = () => planTape({ songs: [{ title: "Short", minutes: 4, takes: 1 }, { title: "The Long Drone", minutes: 20, takes: 1 }], speedIps: 30, reelLengthFt: 2500 });
    expect(attempt).toThrow(TapePlanError);
    expect(attempt).toThrow(/The Long Drone/);
    try {
      attempt();
    } catch (error) {
      expect((error as TapePlanError).field).toBe("songs.1.minutes");
    }
  });

  it("says which other speed cannot hold a take instead of failing the plan", () => {
    const plan = planTape({ songs: [{ title: "Epic", minutes: 20, takes: 2 }], speedIps: 15, reelLengthFt: 2500 });
    expect(plan.reelsNeeded).toBe(2);
    const at30 = plan.alternatives.find((a) => a.speedIps === 30)!;
    expect(at30.reelsNeeded).toBeNull();
    expect(at30.note).toMatch(/Epic/);
  });

  it("uses the recorder's own speeds for the alternatives when given", () => {
    const plan = planTape({ songs: [{ minutes: 3, takes: 1 }], speedIps: 15, reelLengthFt: 2500, otherSpeedsIps: [15, 30] });
    expect(plan.alternatives.map((a) => a.speedIps)).toEqual([30]);
    expect(plan.reels[0]!.songs[0]!.title).toBe("Song 1");
  });
});

describe("properties of every plan ([D] from first-fit decreasing)", () => {
  const songArb = fc.record({ minutes: fc.integer({ min: 1, max: 1800 }).map((s) => s / 60), takes: fc.integer({ min: 0, max: 6 }) });
  const inputArb = fc.record({
    songs: fc.array(songArb, { minLength: 1, maxLength: 30 }),
    speedIps: fc.constantFrom(7.5, 15, 30),
    reelLengthFt: fc.constantFrom(1200, 1800, 2400, 2500, 3600),
    allowanceMinutes: fc.constantFrom(0, 0.5, 1, 2),
  });
  const fits = (i: { songs: { minutes: number }[]; speedIps: number; reelLengthFt: number; allowanceMinutes: number }) =>
    i.songs.every((s) => s.minutes <= usableMinutes(i.reelLengthFt, i.speedIps, i.allowanceMinutes));

  it("never needs fewer reels than the total time ÷ usable time per reel, rounded up", () => {
    fc.assert(
      fc.property(inputArb.filter(fits), (input) => {
        const plan = planTape(input);
        const total = input.songs.reduce((s, x) => s + x.minutes * x.takes, 0);
        const perReel = usableMinutes(input.reelLengthFt, input.speedIps, input.allowanceMinutes);
        expect(plan.reelsNeeded).toBeGreaterThanOrEqual(Math.ceil(total / perReel - 1e-9));
      }),
      { numRuns: 300 },
    );
  });

  it("never fills a reel past its usable time", () => {
    fc.assert(
      fc.property(inputArb.filter(fits), (input) => {
        const plan = planTape(input);
        const perReel = usableMinutes(input.reelLengthFt, input.speedIps, input.allowanceMinutes);
        for (const reel of plan.reels) {
          const used = reel.songs.reduce((s, x) => s + x.takes * input.songs[Number(x.title.slice(5)) - 1]!.minutes, 0);
          expect(used).toBeLessThanOrEqual(perReel + 1e-9);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("lays takes out exactly as a plain first-fit decreasing scan would", () => {
    fc.assert(
      fc.property(inputArb.filter(fits), (input) => {
        const capacity = usableMinutes(input.reelLengthFt, input.speedIps, input.allowanceMinutes);
        const takes = input.songs.flatMap((s) => Array.from({ length: s.takes }, () => s.minutes)).sort((a, b) => b - a);
        const used: number[] = [];
        for (const take of takes) {
          const at = used.findIndex((u) => u + take <= capacity + 1e-9);
          if (at >= 0) used[at]! += take;
          else used.push(take);
        }
        const plan = planTape(input);
        expect(plan.reels.map((r) => r.minutesUsed)).toEqual(used.map((u) => Math.round(u * 100) / 100));
      }),
      { numRuns: 300 },
    );
  });

  it("places every take exactly once", () => {
    fc.assert(
      fc.property(inputArb.filter(fits), (input) => {
        const plan = planTape(input);
        const placed = new Map<string, number>();
        for (const reel of plan.reels) for (const s of reel.songs) placed.set(s.title, (placed.get(s.title) ?? 0) + s.takes);
        input.songs.forEach((song, i) => expect(placed.get(`Song ${i + 1}`) ?? 0).toBe(song.takes));
      }),
      { numRuns: 300 },
    );
  });
});
