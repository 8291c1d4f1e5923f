import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { browserPollIntervalMs, browserWaitMs, hookBudgetMs, testBudgetMs } from "./tests/support/waits.ts";

const apiPort = Number(process.env.API_PORT ?? 3000);

// One config: the web app's build and dev server, and every Vitest project.
export default defineConfig({
  root: "apps/web",
  plugins: [react(), tailwindcss()],
  // No source maps in the production build: the API serves dist/ to anyone (decision 002).
  build: { outDir: "dist", emptyOutDir: true, sourcemap: false, chunkSizeWarningLimit: 900 },
  server: {
    port: 5173,
    proxy: { "/api": { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
  test: {
    root: ".",
    projects: [
      {
        test: {
          name: "domain",
          root: "packages/domain",
          environment: "node",
          include: ["src/**/*.test.ts"],
          setupFiles: ["../../tests/support/fail-on-console-error.ts", "../../tests/support/fast-check-seed.ts"],
          testTimeout: testBudgetMs.domain,
        },
      },
      {
        test: {
          name: "api",
          root: ".",
          environment: "node",
          include: ["apps/api/src/**/*.test.ts", "apps/mail-catcher/src/**/*.test.ts", "packages/db/src/**/*.test.ts", "tests/reference/**/*.test.ts"],
          setupFiles: ["tests/support/fail-on-console-error.ts"],
          env: { NODE_ENV: "test" },
          testTimeout: testBudgetMs.api,
          hookTimeout: hookBudgetMs,
        },
      },
      {
        extends: true,
        test: {
          name: "web",
          root: "apps/web",
          environment: "jsdom",
          include: ["src/**/*.test.{ts,tsx}"],
          setupFiles: ["./src/test/setup.ts", "../../tests/support/fail-on-console-error.ts"],
          css: false,
          // Typing into forms in jsdom takes seconds on a loaded 2-core machine; 5 s is not enough.
          testTimeout: testBudgetMs.web,
        },
      },
      {
        test: {
          name: "e2e",
          root: "tests/e2e",
          environment: "node",
          include: ["**/*.spec.ts"],
          setupFiles: ["../support/fail-on-console-error.ts"],
          testTimeout: testBudgetMs.e2e,
          hookTimeout: hookBudgetMs,
          fileParallelism: false,
          // Every expect.poll waits as long as a loaded 2-core machine needs (tests/support/waits.ts).
          expect: { poll: { timeout: browserWaitMs, interval: browserPollIntervalMs } },
        },
      },
    ],
  },
});
