import { randomUUID } from "node:crypto";
import type { AddressInfo } from "node:net";
import express from "express";
import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";

export type CaughtMessage = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
  text: string;
  html: string | null;
  attachments: { filename: string | null; contentType: string; size: number }[];
};

const addresses = (field: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(field) ? field : field ? [field] : []).flatMap((a) => a.value.map((v) => v.address ?? "")).filter(Boolean);

/**
 * A local stand-in for a mail provider: an SMTP server on loopback that keeps what it receives
 * in memory, and a small HTTP API to read it (GET /messages?to=…, DELETE /messages).
 */
export async function startMailCatcher(options: { smtpPort: number; httpPort: number; keep?: number }) {
  const messages: CaughtMessage[] = [];
  const keep = options.keep ?? 1000;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    banner: "Takeup local mail catcher",
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            id: randomUUID(),
            from: addresses(parsed.from)[0] ?? "",
            to: addresses(parsed.to),
            subject: parsed.subject ?? "",
            receivedAt: new Date().toISOString(),
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
            attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? null, contentType: a.contentType, size: a.size })),
          });
          if (messages.length > keep) messages.splice(0, messages.length - keep);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve) => smtp.listen(options.smtpPort, "127.0.0.1", resolve));

  const app = express();
  app.get("/health", (_req, res) => {
    res.json({ status: "ok" });
  });
  app.get("/messages", (req, res) => {
    const to = typeof req.query.to === "string" ? req.query.to.toLowerCase() : null;
    const found = to ? messages.filter((m) => m.to.some((t) => t.toLowerCase() === to)) : messages;
    res.json([...found].reverse());
  });
  app.delete("/messages", (_req, res) => {
    messages.length = 0;
    res.status(204).end();
  });
  const http = app.listen(options.httpPort, "127.0.0.1");
  await new Promise<void>((resolve) => http.once("listening", () => resolve()));

  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    httpPort: (http.address() as AddressInfo).port,
    messages,
    async close() {
      http.close();
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
    },
  };
}
