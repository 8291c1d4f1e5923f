import { roleLabels, type Role } from "@takeup/domain";
import { composeEmail } from "./layout.ts";

export const invitationEmail = (p: {
  studioName: string;
  to: string;
  name: string;
  role: Role;
  clientAccountName: string | null;
  invitedBy: string;
  url: string;
  expiresAt: Date;
}) =>
  composeEmail({
    template: "invitation",
    to: p.to,
    studioName: p.studioName,
    subject: p.clientAccountName
      ? `${p.studioName} invites you to see ${p.clientAccountName}'s sessions`
      : `${p.studioName} invites you to join as ${roleLabels[p.role].toLowerCase()}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      p.clientAccountName
        ? `${p.invitedBy} has given you a sign-in for ${p.clientAccountName} at ${p.studioName}: your sessions, reels and invoices in one place.`
        : `${p.invitedBy} has added you to ${p.studioName}'s back office as ${roleLabels[p.role].toLowerCase()}.`,
      `Choose a password to finish. The link works once and expires on ${p.expiresAt.toUTCString()}.`,
    ],
    action: { label: "Accept the invitation", url: p.url },
  });
