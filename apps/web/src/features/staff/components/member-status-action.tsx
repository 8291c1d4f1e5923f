import { useState } from "react";
import type { StaffMemberDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ConfirmDialog } from "../../../components/ui/confirm-dialog.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useUpdateStaff } from "../api/update-staff.ts";

export function MemberStatusAction({ member }: { member: StaffMemberDto }) {
  const toast = useToast();
  const update = useUpdateStaff();
  const [confirming, setConfirming] = useState(false);

  const setActive = (active: boolean) => {
    update.mutate(
      { userId: member.userId, active },
      {
        onSuccess: (saved) => {
          setConfirming(false);
          toast(saved.active ? `${saved.name} can sign in again` : `${saved.name} is deactivated and signed out`);
        },
        onError: (error) => {
          setConfirming(false);
          toast(errorMessage(error), "error");
        },
      },
    );
  };

  if (!member.active) {
    return (
      <Button variant="secondary" size="sm" pending={update.isPending} onClick={() => setActive(true)} aria-label={`Reactivate ${member.name}`}>
        Reactivate
      </Button>
    );
  }

  return (
    <>
      <Button variant="ghost" size="sm" onClick={() => setConfirming(true)} aria-label={`Deactivate ${member.name}`}>
        Deactivate
      </Button>
      <ConfirmDialog
        open={confirming}
        title={`Deactivate ${member.name}?`}
        confirmLabel="Deactivate"
        tone="danger"
        pending={update.isPending}
        onConfirm={() => setActive(false)}
        onCancel={() => setConfirming(false)}
      >
        <p>
          Deactivating signs {member.name} out everywhere at once, on every device, and stops them signing in again.
        </p>
        <p className="text-muted">Their past work stays on record. You can reactivate them later.</p>
      </ConfirmDialog>
    </>
  );
}
