import type { ClientDetailDto } from "@takeup/domain";
import { ClientContacts } from "./client-contacts.tsx";
import { ClientInvitations } from "./client-invitations.tsx";
import { ClientProfile } from "./client-profile.tsx";
import { ClientUsers } from "./client-users.tsx";

type ClientAccountProps = {
  client: ClientDetailDto;
  /** Staff see the studio's own notes and pending invitations; the client itself does not. */
  audience: "staff" | "client";
  canEdit: boolean;
  timeZone?: string;
};

export function ClientAccount({ client, audience, canEdit, timeZone }: ClientAccountProps) {
  return (
    <div className="grid gap-5 lg:grid-cols-2">
      <div className="flex flex-col gap-5">
        <ClientProfile client={client} showNotes={audience === "staff"} />
        <ClientContacts contacts={client.contacts} />
      </div>
      <div className="flex flex-col gap-5">
        <ClientUsers client={client} canEdit={canEdit} />
        {audience === "staff" ? <ClientInvitations invitations={client.invitations} timeZone={timeZone} /> : null}
      </div>
    </div>
  );
}
