import { useState } from "react";
import { useNavigate } from "react-router";
import { Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canEditClients } from "../../../config/access.ts";
import { paths } from "../../../config/paths.ts";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { AddClientDialog } from "../../../features/clients/components/client-form-dialog.tsx";
import { ClientsTable } from "../../../features/clients/components/clients-table.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function ClientsRoute() {
  const me = useSignedInUser();
  const navigate = useNavigate();
  const clients = useClients();
  const [adding, setAdding] = useState(false);
  const canEdit = canEditClients(me.role);

  return (
    <>
      <PageHeader
        title="Clients"
        description="Bands, producers and labels the studio works with."
        actions={canEdit ? <Button onClick={() => setAdding(true)}>Add client</Button> : null}
      />
      {clients.isPending ? (
        <LoadingState />
      ) : clients.isError ? (
        <ErrorState error={clients.error} onRetry={() => void clients.refetch()} />
      ) : (
        <ClientsTable clients={clients.data} />
      )}
      {canEdit ? (
        <AddClientDialog
          open={adding}
          onClose={() => setAdding(false)}
          onCreated={(client) => navigate(paths.clients.detail.getHref(client.id))}
        />
      ) : null}
    </>
  );
}
