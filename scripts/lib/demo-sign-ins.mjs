// Kept in step with packages/db/src/seed/demo.ts (a test checks the two agree).
export const demoPassword = "studio-demo-2026";
export const demoSignIns = [
  ["owner@wrenfield.test", "owner · Mara Linden"],
  ["manager@wrenfield.test", "manager · Theo Vance"],
  ["priya@wrenfield.test", "engineer · Priya Oduya"],
  ["sam@wrenfield.test", "engineer · Sam Reyes"],
  ["jo@wrenfield.test", "engineer (assistant) · Jo Kettering"],
  ["books@wrenfield.test", "bookkeeper · Lena Marsh"],
  ["band@lanternstatic.test", "client · Lantern Static"],
  ["band@quietorchard.test", "client · The Quiet Orchard"],
];
