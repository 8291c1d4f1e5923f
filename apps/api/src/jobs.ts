import type { BackgroundJob } from "./lib/scheduler.ts";
import { deliverQueuedEmails } from "./lib/outbox.ts";
import { SignInThrottle } from "./lib/sign-in-throttle.ts";
import { loadStudio } from "./routes/studio/studio.service.ts";
import { expireLapsedHolds } from "./routes/bookings/holds.ts";
import { queueHoldNotices, queueReminders } from "./routes/bookings/booking-jobs.ts";
import { queueLowStockAlerts } from "./routes/tape/tape.jobs.ts";
import { recordStorageCharges } from "./routes/vault/vault.jobs.ts";
import { sendInvoiceReminders } from "./routes/invoices/invoices.jobs.ts";

const minute = 60_000;

/** Every capability's background work, in the order a tick runs it: queued mail goes out last. */
export const backgroundJobs: readonly BackgroundJob[] = [
  { name: "lapse-holds", everyMs: minute, run: async ({ db, now }) => expireLapsedHolds(db, await loadStudio(db), now) },
  { name: "hold-notices", everyMs: minute, run: ({ db, now }) => queueHoldNotices(db, now) },
  { name: "session-reminders", everyMs: minute, run: ({ db, now }) => queueReminders(db, now) },
  { name: "tape-low-stock", everyMs: 5 * minute, run: ({ db, now }) => queueLowStockAlerts(db, now) },
  { name: "vault-storage-fees", everyMs: 60 * minute, run: ({ db, now }) => recordStorageCharges(db, now) },
  // Invoices keep their own per-step e-mail rows (they attach the PDF when sending).
  { name: "invoice-reminders", everyMs: 60 * minute, run: ({ db, mailer, now, appUrl }) => sendInvoiceReminders(db, mailer, now, appUrl) },
  {
    name: "purge-sign-in-counters",
    everyMs: 10 * minute,
    run: async ({ db }) => {
      await new SignInThrottle(db).purgeExpired();
      return 0;
    },
  },
  { name: "deliver-email", everyMs: 15_000, run: ({ db, mailer, now }) => deliverQueuedEmails(db, mailer, now) },
];
