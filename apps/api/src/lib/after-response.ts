import type { Response } from "express";
import { logger } from "./logger.ts";

const pending = new Set<Promise<void>>();

/**
 * Runs `work` once the response has been handed to the client, so how long it takes (or whether
 * there was anything to do) cannot be read from the answer's timing. Failures are logged, never
 * thrown: the client already has its answer.
 */
export function afterResponse(res: Response, what: string, work: () => Promise<void>): void {
  const run = () => {
    const job = work()
      .catch((error: unknown) => {
        logger.error("work after the response failed", { what, reason: error instanceof Error ? error.message : String(error) });
      })
      .finally(() => pending.delete(job));
    pending.add(job);
  };
  // "close" also covers a client that hung up before the end; the work is still owed.
  let started = false;
  const once = () => {
    if (started) return;
    started = true;
    run();
  };
  res.once("finish", once);
  res.once("close", once);
}

/** Resolves when every piece of work started after a response has ended (tests, shutdown). */
export async function settleAfterResponseWork(): Promise<void> {
  while (pending.size > 0) await Promise.allSettled([...pending]);
}
