import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { demoClients, demoPassword, demoStaff } from "./demo.ts";
import * as printed from "../../../../scripts/lib/demo-sign-ins.mjs";

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../..");
const seededSignIns = [...demoStaff.map((s) => s.email), ...demoClients.flatMap((c) => (c.user ? [c.user.email] : []))];

describe("the demo sign-ins", () => {
  it("printed by npm start are exactly the seeded ones, with the seeded password", () => {
    expect(printed.demoPassword).toBe(demoPassword);
    expect(printed.demoSignIns.map(([email]) => email).sort()).toEqual([...seededSignIns].sort());
  });

  it("are all in the README, with the password on a line that says password", () => {
    const readme = readFileSync(path.join(repo, "README.md"), "utf8");
    for (const email of seededSignIns) expect(readme).toContain(`\`${email}\``);
    expect(readme.split("\n").some((line) => /password/i.test(line) && line.includes(`\`${demoPassword}\``))).toBe(true);
  });

  it("use addresses under the reserved .test domain (RFC 2606)", () => {
    for (const email of seededSignIns) expect(email).toMatch(/\.test$/);
  });
});
