import { randomUUID } from "node:crypto";
import { and, asc, eq, isNull, lt, or, sql } from "drizzle-orm";
import { emailMessages, type Db, type Tx } from "@takeup/db";
import type { Mailer, OutgoingEmail } from "./mailer.ts";
import { logger } from "./logger.ts";

/** A queued message is tried this many times before it is marked failed. */
export const maxDeliveryAttempts = 5;
/** How long a delivery run may hold its claim before another process may take the rows over. */
const claimMs = 5 * 60_000;

/**
 * Queues an e-mail under a key naming what it is about, inside the caller's transaction, so the
 * message exists exactly when the change it reports commits. A key queued before is left alone:
 * a repeated or concurrent run queues nothing new. Returns whether this call queued it.
 */
export async function enqueueEmail(tx: Tx | Db, key: string, message: OutgoingEmail, now = new Date()): Promise<boolean> {
  // INSERT IGNORE: 0 rows affected when the key exists (ON DUPLICATE KEY UPDATE would count a
  // found row as affected under mysql2's FOUND_ROWS flag).
  const [result] = await tx
    .insert(emailMessages)
    .ignore()
    .values({
      dedupeKey: key,
      toAddress: message.to,
      subject: message.subject.slice(0, 200),
      template: message.template,
      status: "queued",
      textBody: message.text,
      htmlBody: message.html,
      attachments: message.attachments?.map((a) => ({ filename: a.filename, contentType: a.contentType, contentBase64: Buffer.from(a.content).toString("base64") })) ?? null,
      createdAt: now,
    });
  return result.affectedRows === 1;
}

/**
 * Sends queued mail. Rows are claimed with one UPDATE (a write, so two processes — or two Galera
 * nodes — cannot both claim a row), then sent outside any transaction and marked sent. A run that
 * dies mid-way leaves its claim to expire, and the rows are tried again.
 */
export async function deliverQueuedEmails(db: Db, mailer: Mailer, now = new Date(), limit = 50): Promise<number> {
  const token = randomUUID();
  await db
    .update(emailMessages)
    .set({ claimToken: token, claimedUntil: new Date(now.getTime() + claimMs), attempts: sql`${emailMessages.attempts} + 1` })
    .where(and(eq(emailMessages.status, "queued"), or(isNull(emailMessages.claimedUntil), lt(emailMessages.claimedUntil, now))))
    .orderBy(asc(emailMessages.id))
    .limit(limit);
  const claimed = await db.select().from(emailMessages).where(eq(emailMessages.claimToken, token)).orderBy(asc(emailMessages.id));
  let sent = 0;
  for (const row of claimed) {
    try {
      const { messageId } = await mailer.transmit({
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody ?? "",
        html: row.htmlBody ?? "",
        template: row.template,
        attachments: row.attachments?.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, "base64") })),
      });
      await db.update(emailMessages).set({ status: "sent", providerMessageId: messageId, sentAt: new Date(), claimToken: null, error: null }).where(eq(emailMessages.id, row.id));
      sent++;
    } catch (error) {
      const reason = (error instanceof Error ? error.message : String(error)).slice(0, 2000);
      logger.error("queued e-mail failed", { id: row.id, to: row.toAddress, template: row.template, attempt: row.attempts, reason });
      const gaveUp = row.attempts >= maxDeliveryAttempts;
      // Released at once so the next run tries again (or marked failed after the last attempt).
      await db
        .update(emailMessages)
        .set({ status: gaveUp ? "failed" : "queued", error: reason, claimToken: null, claimedUntil: null })
        .where(eq(emailMessages.id, row.id));
    }
  }
  return sent;
}
