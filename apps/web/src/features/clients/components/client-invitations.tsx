import type { PendingInvitationDto } from "@takeup/domain";
import { Card } from "../../../components/ui/card.tsx";
import { formatDate } from "../../../lib/dates.ts";

export function ClientInvitations({ invitations, timeZone }: { invitations: PendingInvitationDto[]; timeZone?: string }) {
  return (
    <Card title="Waiting to accept">
      {invitations.length === 0 ? (
        <p className="text-sm text-muted">No invitations are waiting.</p>
      ) : (
        <ul className="-my-3 divide-y divide-line">
          {invitations.map((invitation) => (
            <li key={invitation.id} className="py-2.5 text-sm">
              <p className="font-medium">{invitation.name}</p>
              <p className="break-all text-muted">
                {invitation.email} · expires {formatDate(invitation.expiresAt, timeZone)}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
