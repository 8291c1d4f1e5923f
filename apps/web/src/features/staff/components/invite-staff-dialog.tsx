import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { inviteStaffInput, roleLabels, staffRoles } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useInviteStaff } from "../api/invite-staff.ts";

type InviteStaffDialogProps = { open: boolean; onClose: () => void };

export function InviteStaffDialog({ open, onClose }: InviteStaffDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Invite someone to the team"
      description="They get an e-mail with a link to choose a password. The link works for a limited time."
    >
      <InviteStaffForm onDone={onClose} onCancel={onClose} />
    </Dialog>
  );
}

function InviteStaffForm({ onDone, onCancel }: { onDone: () => void; onCancel: () => void }) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(inviteStaffInput),
    defaultValues: { name: "", email: "", role: "engineer" as const },
  });
  const invite = useInviteStaff();

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    invite.mutate(values, {
      onSuccess: (invitation) => {
        toast(`Invitation sent to ${invitation.email}`);
        onDone();
      },
      onError: (error) =>
        setFormError(
          applyApiErrors(error, setError, { fields: ["name", "email", "role"], codeFields: { email_taken: "email" } }),
        ),
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
      <FormField label="Role" error={errors.role?.message}>
        {(field) => (
          <Select {...field} {...register("role")}>
            {staffRoles.map((role) => (
              <option key={role} value={role}>
                {roleLabels[role]}
              </option>
            ))}
          </Select>
        )}
      </FormField>
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={invite.isPending}>
          Send invitation
        </Button>
      </DialogActions>
    </form>
  );
}
