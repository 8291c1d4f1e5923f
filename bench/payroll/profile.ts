// Where a step's CPU time goes, by package, from a V8 CPU profile: Node's and V8's own frames
// are charged to the innermost package (or workspace of ours) that called them.
import type { CpuProfile } from "./child.ts";

export type StepProfile = { busyMs: number; byOrigin: Record<string, number> };

function origin(url: string): string | null {
  if (!url || url.startsWith("node:")) return null;
  const inModules = url.split("/node_modules/").at(-1)!;
  if (inModules !== url) return inModules.startsWith("@") ? inModules.split("/").slice(0, 2).join("/") : inModules.split("/")[0]!;
  return url.match(/\/((?:packages|apps|bench)\/[^/]+)\//)?.[1] ?? "other";
}

/** Only the samples inside `window` (the step's start and end on the profiler's clock, µs) count. */
export function profileStep(profile: CpuProfile, window: [number, number]): StepProfile {
  const nodes = new Map(profile.nodes.map((n) => [n.id, n]));
  const parents = new Map<number, number>();
  for (const n of profile.nodes) for (const child of n.children ?? []) parents.set(child, n.id);
  const originOf = (id: number) => {
    for (let at: number | undefined = id; at !== undefined; at = parents.get(at)) {
      const label = origin(nodes.get(at)!.callFrame.url);
      if (label) return label;
    }
    return "Node.js";
  };
  const byOrigin: Record<string, number> = {};
  let busy = 0;
  let clock = profile.startTime;
  profile.samples.forEach((id, i) => {
    const micros = profile.timeDeltas[i] ?? 0;
    clock += micros;
    const name = nodes.get(id)!.callFrame.functionName;
    if (clock < window[0] || clock > window[1] || name === "(idle)") return;
    busy += micros;
    const label = name === "(garbage collector)" ? "V8 garbage collector" : originOf(id);
    byOrigin[label] = (byOrigin[label] ?? 0) + micros / 1000;
  });
  return { busyMs: busy / 1000, byOrigin };
}
