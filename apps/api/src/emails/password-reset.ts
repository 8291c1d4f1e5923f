import { composeEmail } from "./layout.ts";

export const passwordResetEmail = (p: { studioName: string; to: string; name: string; url: string }) =>
  composeEmail({
    template: "password_reset",
    to: p.to,
    studioName: p.studioName,
    subject: `Reset your ${p.studioName} password`,
    greeting: `Hello ${p.name},`,
    paragraphs: ["Someone asked to reset the password for your sign-in. The link below works once, for one hour."],
    action: { label: "Choose a new password", url: p.url },
    footnote: "If it was not you, ignore this message: your password stays as it is.",
  });
