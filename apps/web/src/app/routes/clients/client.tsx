import { useState } from "react";
import { Link, useParams } from "react-router";
import type { ClientDetailDto } from "@takeup/domain";
import { Button, buttonStyles } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canEditClients } from "../../../config/access.ts";
import { paths } from "../../../config/paths.ts";
import { useClient } from "../../../features/clients/api/get-client.ts";
import { ClientAccount } from "../../../features/clients/components/client-account.tsx";
import { EditClientDialog } from "../../../features/clients/components/client-form-dialog.tsx";
import { InviteClientUserDialog } from "../../../features/clients/components/invite-client-user-dialog.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { ApiError } from "../../../lib/api-client.ts";
import { NotFoundRoute } from "../not-found.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function ClientRoute() {
  const { clientId } = useParams();
  const id = Number(clientId);
  if (!Number.isSafeInteger(id) || id <= 0) return <NotFoundRoute />;
  return <ClientPage id={id} />;
}

function ClientPage({ id }: { id: number }) {
  const client = useClient(id);
  if (client.isPending) return <LoadingState />;
  if (client.isError) {
    if (client.error instanceof ApiError && client.error.status === 404) return <NotFoundRoute />;
    return <ErrorState error={client.error} onRetry={() => void client.refetch()} />;
  }
  return <ClientView client={client.data} />;
}

function ClientView({ client }: { client: ClientDetailDto }) {
  const me = useSignedInUser();
  const studio = useStudio();
  const canEdit = canEditClients(me.role);
  const [dialog, setDialog] = useState<"edit" | "invite" | null>(null);
  const close = () => setDialog(null);

  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.clients.list.getHref()} className="font-medium text-muted underline-offset-2 hover:text-ink hover:underline">
          ← All clients
        </Link>
      </p>
      <PageHeader
        title={client.name}
        actions={
          canEdit ? (
            <>
              <Link to={paths.invoices.billable.getHref(client.id)} className={buttonStyles("secondary")}>Billable items</Link>
              <Button variant="secondary" onClick={() => setDialog("invite")}>
                Invite a client user
              </Button>
              <Button onClick={() => setDialog("edit")}>Edit</Button>
            </>
          ) : null
        }
      />
      <ClientAccount client={client} audience="staff" canEdit={canEdit} timeZone={studio.data?.timeZone} />
      {canEdit ? (
        <>
          <EditClientDialog open={dialog === "edit"} onClose={close} client={client} />
          <InviteClientUserDialog open={dialog === "invite"} onClose={close} clientId={client.id} clientName={client.name} />
        </>
      ) : null}
    </>
  );
}
