import { roleLabels, type InvitationDto } from "@takeup/domain";
import { formatDate } from "../../../lib/dates.ts";

export function InvitationSummary({ invitation }: { invitation: InvitationDto }) {
  const role = roleLabels[invitation.role];
  return (
    <div className="rounded-md border border-line bg-paper px-4 py-3 text-sm">
      <p className="text-base font-semibold">{invitation.name}</p>
      <p className="mt-1">
        You&apos;re invited to {invitation.studioName} as {role}
        {invitation.clientAccountName ? ` for ${invitation.clientAccountName}` : null}.
      </p>
      <p className="mt-2 text-muted">
        You will sign in as <span className="font-medium text-ink">{invitation.email}</span>. This link works until{" "}
        {formatDate(invitation.expiresAt)}.
      </p>
    </div>
  );
}
