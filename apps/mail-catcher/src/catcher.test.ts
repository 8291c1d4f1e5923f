import { afterAll, beforeAll, describe, expect, it } from "vitest";
import nodemailer from "nodemailer";
import { startMailCatcher } from "./catcher.ts";

describe("mail catcher", () => {
  let catcher: Awaited<ReturnType<typeof startMailCatcher>>;
  beforeAll(async () => {
    catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  });
  afterAll(() => catcher.close());

  it("receives a message over real SMTP and serves it, text and HTML, filtered by recipient", async () => {
    const transport = nodemailer.createTransport(`smtp://127.0.0.1:${catcher.smtpPort}`);
    await transport.sendMail({
      from: "studio@takeup.test",
      to: "drummer@example.test",
      subject: "Session confirmed",
      text: "See you at ten.",
      html: "<p>See you at ten.</p>",
    });
    transport.close();
    const response = await fetch(`http://127.0.0.1:${catcher.httpPort}/messages?to=drummer@example.test`);
    const [message] = (await response.json()) as unknown[];
    expect(message).toMatchObject({
      to: ["drummer@example.test"],
      subject: "Session confirmed",
      text: expect.stringContaining("See you at ten."),
      html: "<p>See you at ten.</p>",
    });
    const other = await fetch(`http://127.0.0.1:${catcher.httpPort}/messages?to=nobody@example.test`);
    expect(await other.json()).toEqual([]);
  });
});
