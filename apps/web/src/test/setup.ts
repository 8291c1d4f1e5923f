import "@testing-library/jest-dom/vitest";
import { cleanup, configure } from "@testing-library/react";
import { afterEach, vi } from "vitest";
import { componentWaitMs } from "../../../../tests/support/waits";

// findBy*/waitFor give up after 1 s by default: too short on a loaded 2-core machine.
configure({ asyncUtilTimeout: componentWaitMs });

afterEach(() => {
  cleanup();
  // Tests stub fetch one by one; a stub leaking into the next test would hide missing mocks.
  vi.unstubAllGlobals();
});
