// Time and memory of one step, measured inside the child process that runs it. A sampling timer
// would never fire during the engine's synchronous run, so the heap peak comes from V8 itself:
// the GC profiler records the heap in use just before every collection (when it is highest),
// and the process's peak RSS is the kernel's high-water mark.
import { GCProfiler } from "node:v8";
import { Writable } from "node:stream";

export type StepResult = {
  seconds: number;
  /** RSS and heap in use as the step began: Node.js, the modules and the step's input. */
  startRssMiB: number;
  startHeapMiB: number;
  /** The most heap in use at any point of the step (before any GC, or at its end). */
  peakHeapMiB: number;
  /** The process's peak RSS so far (kernel high-water mark), read at the end of the step. */
  peakRssMiB: number;
  /** The step's start and end on the CPU profiler's clock (µs), to pick its samples out of a profile. */
  windowMicros: [number, number];
};

const nowMicros = () => Number(process.hrtime.bigint() / 1000n);

const mib = (bytes: number) => bytes / 2 ** 20;
// The profiler's statistics are camelCase at run time, whatever @types/node says.
type GcHeap = { usedHeapSize: number };

export async function measureStep<T>(work: () => T | Promise<T>): Promise<{ value: T; step: StepResult }> {
  const start = process.memoryUsage();
  const profiler = new GCProfiler();
  profiler.start();
  const started = performance.now();
  const startedMicros = nowMicros();
  const value = await work();
  const endedMicros = nowMicros();
  const seconds = (performance.now() - started) / 1000;
  const end = process.memoryUsage();
  const gcs = profiler.stop().statistics;
  const beforeEachGc = gcs.map((g) => (g.beforeGC.heapStatistics as unknown as GcHeap).usedHeapSize);
  return {
    value,
    step: {
      seconds,
      startRssMiB: mib(start.rss),
      startHeapMiB: mib(start.heapUsed),
      peakHeapMiB: mib(beforeEachGc.reduce((peak, used) => Math.max(peak, used), Math.max(start.heapUsed, end.heapUsed))),
      peakRssMiB: process.resourceUsage().maxRSS / 1024,
      windowMicros: [startedMicros, endedMicros],
    },
  };
}

/** Where the workbook goes in the timed runs: nowhere, but every byte is counted. */
export class ByteCounter extends Writable {
  bytes = 0;
  override _write(chunk: Buffer, _encoding: BufferEncoding, done: (error?: Error | null) => void) {
    this.bytes += chunk.length;
    done();
  }
}

/** Sends the child's result to run.ts and lets the process end. */
export function report(result: unknown) {
  if (!process.send) {
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
    return;
  }
  process.send(result, () => process.disconnect());
}
