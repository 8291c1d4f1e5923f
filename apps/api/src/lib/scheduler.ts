import { hostname } from "node:os";
import { randomUUID } from "node:crypto";
import { and, eq, lte } from "drizzle-orm";
import { scheduledJobs, type Db } from "@takeup/db";
import type { Mailer } from "./mailer.ts";
import { logger } from "./logger.ts";

/** What every job gets: the database, the mailer, the app's public address (for links) and the time. */
export type JobServices = { db: Db; mailer: Mailer; appUrl: string };
export type JobContext = JobServices & { now: Date };

/** A piece of background work that lives with its capability; the scheduler only decides when. */
export type BackgroundJob = {
  name: string;
  /** How often it runs, across all API processes together. */
  everyMs: number;
  /** Does the work; returns how many things it handled (for the log). */
  run(context: JobContext): Promise<number>;
};

/**
 * Takes the job's due run for this process: one UPDATE moves `next_run_at` on only if it is due,
 * so of several processes (or Galera nodes) ticking at once exactly one gets it (decision 017).
 */
export async function claimDueRun(db: Db, job: BackgroundJob, holder: string, now: Date): Promise<boolean> {
  await db.insert(scheduledJobs).ignore().values({ name: job.name, nextRunAt: now });
  const [result] = await db
    .update(scheduledJobs)
    .set({ nextRunAt: new Date(now.getTime() + job.everyMs), lastHolder: holder, lastStartedAt: now })
    .where(and(eq(scheduledJobs.name, job.name), lte(scheduledJobs.nextRunAt, now)));
  return result.affectedRows === 1;
}

/** Runs, in order, every job whose turn it is; a failing job is logged and the others still run. */
export async function runDueJobs(services: JobServices, jobs: readonly BackgroundJob[], holder: string, now = new Date()) {
  const { db } = services;
  const handled: Record<string, number> = {};
  for (const job of jobs) {
    if (!(await claimDueRun(db, job, holder, now))) continue;
    try {
      handled[job.name] = await job.run({ ...services, now });
      await db.update(scheduledJobs).set({ lastFinishedAt: new Date(), lastResult: handled[job.name], lastError: null }).where(eq(scheduledJobs.name, job.name));
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      logger.error("scheduled job failed", { job: job.name, reason });
      await db.update(scheduledJobs).set({ lastFinishedAt: new Date(), lastError: reason.slice(0, 2000) }).where(eq(scheduledJobs.name, job.name)).catch(() => {});
    }
  }
  return handled;
}

/** Ticks every `tickMs` and runs the jobs that are due; returns a function that stops it. */
export function startScheduler(services: JobServices, jobs: readonly BackgroundJob[], tickMs = 15_000) {
  const holder = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      await runDueJobs(services, jobs, holder);
    } catch (error) {
      logger.error("scheduled work failed", { reason: error instanceof Error ? error.message : String(error) });
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), tickMs);
  void tick();
  return () => clearInterval(timer);
}
