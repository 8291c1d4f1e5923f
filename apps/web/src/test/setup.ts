import "@testing-library/jest-dom/vitest";
import { cleanup } from "@testing-library/react";
import { afterEach, vi } from "vitest";

afterEach(() => {
  cleanup();
  // Tests stub fetch one by one; a stub leaking into the next test would hide missing mocks.
  vi.unstubAllGlobals();
});
