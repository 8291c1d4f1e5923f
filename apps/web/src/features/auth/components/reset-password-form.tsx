import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useResetPassword } from "../api/reset-password.ts";
import { newPasswordForm } from "./password-fields.ts";

type ResetPasswordFormProps = { token: string; onDone: () => void };

export function ResetPasswordForm({ token, onDone }: ResetPasswordFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(newPasswordForm),
    defaultValues: { password: "", confirmPassword: "" },
  });
  const reset = useResetPassword();

  const onSubmit = handleSubmit(({ password }) => {
    setFormError(null);
    reset.mutate(
      { token, password },
      {
        onSuccess: onDone,
        onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["password"] })),
      },
    );
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="New password" hint="At least 10 characters." error={errors.password?.message}>
        {(field) => <Input {...field} {...register("password")} type="password" autoComplete="new-password" />}
      </FormField>
      <FormField label="Confirm new password" error={errors.confirmPassword?.message}>
        {(field) => <Input {...field} {...register("confirmPassword")} type="password" autoComplete="new-password" />}
      </FormField>
      <Button type="submit" pending={reset.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
