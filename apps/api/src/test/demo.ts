/** Demo sign-ins by role, from the seed (packages/db/src/seed/demo.ts). */
export const demo = {
  owner: "owner@wrenfield.test",
  manager: "manager@wrenfield.test",
  engineer: "priya@wrenfield.test",
  bookkeeper: "books@wrenfield.test",
  client: "band@lanternstatic.test",
  otherClient: "band@quietorchard.test",
} as const;
