import nodemailer, { type Transporter } from "nodemailer";
import { emailMessages, type Db } from "@takeup/db";
import { logger } from "./logger.ts";

export type OutgoingEmail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Which template made it, for the e-mail log. */
  template: string;
  attachments?: { filename: string; content: string | Buffer; contentType?: string }[];
};

export type Mailer = {
  /** Sends now and logs the attempt (mail a request owes its caller). */
  send(message: OutgoingEmail): Promise<void>;
  /** Hands the message to SMTP without logging it: the outbox logs queued mail on its own row. */
  transmit(message: OutgoingEmail): Promise<{ messageId: string | null }>;
  close(): void;
};

/** nodemailer over SMTP (a local catcher in development and tests); every attempt is logged. */
export function createMailer(db: Db, smtpUrl: string, from: string, fromName: () => Promise<string>): Mailer {
  const transport: Transporter = nodemailer.createTransport(smtpUrl);
  const transmit = async (message: OutgoingEmail) => {
    const info = await transport.sendMail({
      from: { name: await fromName(), address: from },
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html,
      attachments: message.attachments,
    });
    return { messageId: (info.messageId as string | undefined) ?? null };
  };
  return {
    transmit,
    async send(message) {
      const logged = { toAddress: message.to, subject: message.subject, template: message.template };
      try {
        const { messageId } = await transmit(message);
        await db.insert(emailMessages).values({ ...logged, status: "sent", providerMessageId: messageId, sentAt: new Date() });
      } catch (error) {
        const reason = error instanceof Error ? error.message : String(error);
        logger.error("e-mail failed", { to: message.to, template: message.template, reason });
        await db.insert(emailMessages).values({ ...logged, status: "failed", error: reason.slice(0, 2000) });
        throw error;
      }
    },
    close: () => transport.close(),
  };
}

/** A mailer that drops every message, for apps whose test or benchmark sends no mail that matters. */
export const discardingMailer: Mailer = { send: async () => {}, transmit: async () => ({ messageId: null }), close: () => {} };
