import { afterEach, beforeEach, vi } from "vitest";

// A console.error during a test fails it: errors nobody asserted on are bugs hiding.
let errors: unknown[][] = [];
beforeEach(() => {
  errors = [];
  vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    errors.push(args);
  });
});
afterEach(() => {
  vi.mocked(console.error).mockRestore();
  if (errors.length > 0) {
    const shown = errors.map((args) => args.map(String).join(" ")).join("\n");
    throw new Error(`console.error was called during the test:\n${shown}`);
  }
});
