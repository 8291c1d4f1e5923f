import { useState } from "react";
import type { ClientDetailDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ConfirmDialog } from "../../../components/ui/confirm-dialog.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useUpdateClientUser } from "../api/update-client-user.ts";

type ClientUser = ClientDetailDto["users"][number];

export function ClientUserStatusAction({ clientId, user }: { clientId: number; user: ClientUser }) {
  const toast = useToast();
  const update = useUpdateClientUser(clientId);
  const [confirming, setConfirming] = useState(false);

  const setActive = (active: boolean) => {
    update.mutate(
      { userId: user.userId, active },
      {
        onSuccess: () => toast(active ? `${user.name} can sign in again` : `${user.name} is deactivated and signed out`),
        onError: (error) => toast(errorMessage(error), "error"),
        onSettled: () => setConfirming(false),
      },
    );
  };

  if (!user.active) {
    return (
      <Button variant="secondary" size="sm" pending={update.isPending} onClick={() => setActive(true)} aria-label={`Reactivate ${user.name}`}>
        Reactivate
      </Button>
    );
  }
  return (
    <>
      <Button variant="ghost" size="sm" onClick={() => setConfirming(true)} aria-label={`Deactivate ${user.name}`}>
        Deactivate
      </Button>
      <ConfirmDialog
        open={confirming}
        title={`Deactivate ${user.name}?`}
        confirmLabel="Deactivate"
        tone="danger"
        pending={update.isPending}
        onConfirm={() => setActive(false)}
        onCancel={() => setConfirming(false)}
      >
        <p>Deactivating signs {user.name} out everywhere at once and stops them signing in to this account.</p>
        <p className="text-muted">You can reactivate them later.</p>
      </ConfirmDialog>
    </>
  );
}
