import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { inviteClientUserInput } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useInviteClientUser } from "../api/invite-client-user.ts";

type InviteClientUserDialogProps = { open: boolean; onClose: () => void; clientId: number; clientName: string };

export function InviteClientUserDialog({ open, onClose, clientId, clientName }: InviteClientUserDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Invite a client user"
      description={`They will sign in to see ${clientName}'s account, and nothing of other clients.`}
    >
      <InviteClientUserForm clientId={clientId} onDone={onClose} />
    </Dialog>
  );
}

function InviteClientUserForm({ clientId, onDone }: { clientId: number; onDone: () => void }) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(inviteClientUserInput),
    defaultValues: { name: "", email: "" },
  });
  const invite = useInviteClientUser(clientId);

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    invite.mutate(values, {
      onSuccess: (invitation) => {
        toast(`Invitation sent to ${invitation.email}`);
        onDone();
      },
      onError: (error) =>
        setFormError(applyApiErrors(error, setError, { fields: ["name", "email"], codeFields: { email_taken: "email" } })),
    });
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="Name" error={errors.name?.message}>
        {(field) => <Input {...field} {...register("name")} autoComplete="off" />}
      </FormField>
      <FormField label="E-mail" error={errors.email?.message}>
        {(field) => <Input {...field} {...register("email")} type="email" autoComplete="off" />}
      </FormField>
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={invite.isPending}>
          Send invitation
        </Button>
      </DialogActions>
    </form>
  );
}
