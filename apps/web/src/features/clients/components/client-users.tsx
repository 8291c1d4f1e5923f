import type { ClientDetailDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { ClientUserStatusAction } from "./client-user-status-action.tsx";

type ClientUsersProps = { client: ClientDetailDto; canEdit: boolean };

export function ClientUsers({ client, canEdit }: ClientUsersProps) {
  return (
    <Card title="People with sign-ins">
      {client.users.length === 0 ? (
        <p className="text-sm text-muted">Nobody at {client.name} can sign in yet.</p>
      ) : (
        <ul className="-my-3 divide-y divide-line">
          {client.users.map((user) => (
            <li key={user.userId} className="flex flex-wrap items-center justify-between gap-2 py-2.5 text-sm">
              <div className="min-w-0">
                <p className="flex items-center gap-2 font-medium">
                  {user.name}
                  {user.active ? null : <Badge tone="muted">Deactivated</Badge>}
                </p>
                <p className="break-all text-muted">{user.email}</p>
              </div>
              {canEdit ? <ClientUserStatusAction clientId={client.id} user={user} /> : null}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
