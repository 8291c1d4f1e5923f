import { useId } from "react";
import { roleLabels, roles, type PendingInvitationDto, type Role } from "@takeup/domain";
import { formatDate } from "../../../lib/dates.ts";

const labelFor = (role: string) => (roles.includes(role as Role) ? roleLabels[role as Role] : role);

type PendingInvitationsProps = { invitations: PendingInvitationDto[]; timeZone?: string };

export function PendingInvitations({ invitations, timeZone }: PendingInvitationsProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="mt-10">
      <h2 id={headingId} className="text-lg font-semibold">
        Waiting to accept
      </h2>
      {invitations.length === 0 ? (
        <p className="mt-2 text-sm text-muted">No invitations are waiting.</p>
      ) : (
        <ul className="mt-3 divide-y divide-line rounded-lg border border-line bg-card">
          {invitations.map((invitation) => (
            <li key={invitation.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-2.5 text-sm">
              <span className="min-w-0">
                <span className="font-medium">{invitation.name}</span>{" "}
                <span className="break-all text-muted">{invitation.email}</span>
              </span>
              <span className="text-muted">
                {labelFor(invitation.role)} · expires {formatDate(invitation.expiresAt, timeZone)}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
