import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { MeDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useAcceptInvitation } from "../api/accept-invitation.ts";
import { acceptInvitationForm } from "./password-fields.ts";

type AcceptInvitationFormProps = { token: string; email: string; onAccepted: (me: MeDto) => void };

export function AcceptInvitationForm({ token, email, onAccepted }: AcceptInvitationFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(acceptInvitationForm),
    defaultValues: { password: "", confirmPassword: "" },
  });
  const accept = useAcceptInvitation(token, { onSuccess: onAccepted });

  const onSubmit = handleSubmit(({ password }) => {
    setFormError(null);
    accept.mutate({ password }, { onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["password"] })) });
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      {/* Lets password managers file the new password under the right address. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <FormField label="Password" hint="At least 10 characters." error={errors.password?.message}>
        {(field) => <Input {...field} {...register("password")} type="password" autoComplete="new-password" />}
      </FormField>
      <FormField label="Confirm password" error={errors.confirmPassword?.message}>
        {(field) => <Input {...field} {...register("confirmPassword")} type="password" autoComplete="new-password" />}
      </FormField>
      <Button type="submit" pending={accept.isPending} className="w-full">
        Accept and sign in
      </Button>
    </form>
  );
}
