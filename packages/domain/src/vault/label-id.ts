/**
 * Takeup's own reel label id: `RL-` + the reel's number in six digits + `-` + one check character,
 * e.g. `RL-000042-?`. The format is ours (docs/tape.md, "Vault"). The check character is the
 * Luhn mod N algorithm over the 36 characters 0–9 A–Z (Wikipedia, "Luhn mod N algorithm" [stated]),
 * which catches every single mistyped character and every swap of two neighbouring digits.
 */
const alphabet = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ";
const n = alphabet.length;

export const labelIdPattern = /^RL-\d{6}-[0-9A-Z]$/;

/** The check character for a string of characters from the alphabet. */
export function labelCheckCharacter(body: string): string {
  let factor = 2;
  let sum = 0;
  for (let i = body.length - 1; i >= 0; i--) {
    const code = alphabet.indexOf(body[i]!);
    if (code < 0) throw new Error(`"${body[i]}" is not a label character`);
    let addend = factor * code;
    factor = factor === 2 ? 1 : 2;
    addend = Math.floor(addend / n) + (addend % n);
    sum += addend;
  }
  return alphabet[(n - (sum % n)) % n]!;
}

/** The label id of reel number `reelNumber` (1 … 999 999). */
export function labelIdFor(reelNumber: number): string {
  if (!Number.isInteger(reelNumber) || reelNumber < 1 || reelNumber > 999_999) throw new Error(`reel number ${reelNumber} is out of range`);
  const digits = String(reelNumber).padStart(6, "0");
  return `RL-${digits}-${labelCheckCharacter(digits)}`;
}

export type LabelScan = { ok: true; labelId: string; reelNumber: number } | { ok: false; problem: string };

/**
 * Reads what was typed or scanned: case, spaces and the dashes do not matter
 * (`rl 000042 x`, `RL000042X`). A wrong check character is reported as a mistyped id.
 */
export function readLabelId(text: string): LabelScan {
  const compact = text.toUpperCase().replace(/[\s-]/g, "");
  const match = /^RL(\d{6})([0-9A-Z])$/.exec(compact);
  if (!match) return { ok: false, problem: "A label id looks like RL-000042-X: RL, six digits and a check character" };
  const digits = match[1]!;
  if (labelCheckCharacter(digits) !== match[2]) return { ok: false, problem: `RL-${digits}-${match[2]} is not a valid label id: its check character does not match (mistyped?)` };
  return { ok: true, labelId: `RL-${digits}-${match[2]}`, reelNumber: Number(digits) };
}
