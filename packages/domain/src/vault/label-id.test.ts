import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { labelCheckCharacter, labelIdFor, labelIdPattern, readLabelId } from "./label-id.ts";

const alphabet = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ";

describe("reel label ids (our own format, Luhn mod N check character [stated: Wikipedia, Luhn mod N algorithm])", () => {
  it("writes RL, the reel number in six digits and a check character", () => {
    expect(labelIdFor(42)).toMatch(labelIdPattern);
    expect(labelIdFor(42).slice(0, 10)).toBe("RL-000042-");
  });

  it("matches the algorithm worked by hand for 000001: the 1 is doubled to 2, so the check is 36 − 2 = Y", () => {
    expect(labelCheckCharacter("000001")).toBe("Y");
    expect(labelIdFor(1)).toBe("RL-000001-Y");
  });

  it("reads back what it writes, whatever the case, spaces or dashes", () => {
    const id = labelIdFor(1234);
    expect(readLabelId(id)).toEqual({ ok: true, labelId: id, reelNumber: 1234 });
    expect(readLabelId(` ${id.toLowerCase().replace(/-/g, " ")} `)).toEqual({ ok: true, labelId: id, reelNumber: 1234 });
    expect(readLabelId(id.replace(/-/g, ""))).toMatchObject({ ok: true, labelId: id });
  });

  it("refuses text that is not shaped like a label id", () => {
    expect(readLabelId("hello")).toMatchObject({ ok: false });
    expect(readLabelId("RL-12-3")).toMatchObject({ ok: false });
  });

  it("catches every single mistyped character", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 7 }), fc.integer({ min: 1, max: 35 }), (reel, position, shift) => {
        const compact = labelIdFor(reel).replace(/-/g, "");
        const at = 2 + position;
        const original = compact[at]!;
        const pool = at < 8 ? "0123456789" : alphabet;
        const replacement = pool[(pool.indexOf(original) + (shift % pool.length || 1)) % pool.length]!;
        if (replacement === original) return;
        const typo = compact.slice(0, at) + replacement + compact.slice(at + 1);
        expect(readLabelId(typo).ok).toBe(false);
      }),
    );
  });

  it("catches every swap of two neighbouring different digits", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 4 }), (reel, position) => {
        const digits = String(reel).padStart(6, "0");
        if (digits[position] === digits[position + 1]) return;
        const swapped = digits.slice(0, position) + digits[position + 1] + digits[position] + digits.slice(position + 2);
        expect(readLabelId(`RL${swapped}${labelCheckCharacter(digits)}`).ok).toBe(false);
      }),
    );
  });
});
