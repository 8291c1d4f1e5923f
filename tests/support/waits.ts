// How long any test waits for something to appear, in one place. The figures fit a 2-core
// machine with other CPU-bound work beside the suite (load average 5–8): accepting an invitation
// hashes a password, a cold page load builds a React tree, and both can take seconds there.
// Waits end as soon as the awaited state shows, so a generous budget costs nothing when green.

/** Browser journeys: `expect.poll`, Playwright actions, navigations and e-mail arrival. */
export const browserWaitMs = 20_000;
/** How often a browser journey re-checks an awaited state. */
export const browserPollIntervalMs = 100;
/** Component tests in jsdom: Testing Library's `findBy*` and `waitFor`. */
export const componentWaitMs = 10_000;

/**
 * How long one test may run before Vitest calls it failed, per project. Property tests of the
 * domain run hundreds of cases and took 5–11 s each beside two CPU burners and other builds
 * (Vitest's default of 5 s failed 12 of them), so every project gets a budget sized for that.
 */
export const testBudgetMs = { domain: 60_000, api: 60_000, web: 30_000, e2e: 120_000 } as const;
/** How long a project's beforeAll/afterAll may take (a fresh database, migrated and seeded). */
export const hookBudgetMs = 120_000;
