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

export type Mailer = { send(message: OutgoingEmail): Promise<void>; close(): void };

/** nodemailer over SMTP (a local catcher in development and tests); every attempt is logged. */
export function createMailer(db: Db, smtpUrl: string, from: string, fromName: () => Promise<string>): Mailer {
  const transport: Transporter = nodemailer.createTransport(smtpUrl);
  return {
    async send(message) {
      try {
        const info = await transport.sendMail({
          from: { name: await fromName(), address: from },
          to: message.to,
          subject: message.subject,
          text: message.text,
          html: message.html,
          attachments: message.attachments,
        });
        await db.insert(emailMessages).values({
          toAddress: message.to,
          subject: message.subject,
          template: message.template,
          status: "sent",
          providerMessageId: info.messageId ?? null,
        });
      } catch (error) {
        const reason = error instanceof Error ? error.message : String(error);
        logger.error("e-mail failed", { to: message.to, template: message.template, reason });
        await db.insert(emailMessages).values({
          toAddress: message.to,
          subject: message.subject,
          template: message.template,
          status: "failed",
          error: reason.slice(0, 2000),
        });
        throw error;
      }
    },
    close: () => transport.close(),
  };
}
