import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { passwordResetRequestInput } from "@takeup/domain";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useRequestPasswordReset } from "../api/request-password-reset.ts";

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(passwordResetRequestInput),
    defaultValues: { email: "" },
  });
  const request = useRequestPasswordReset();

  if (request.isSuccess) {
    // Same words whether or not the address exists, so the form cannot be used to probe for accounts.
    return (
      <p role="status" className="rounded-md border border-line bg-paper px-3 py-3 text-sm">
        If that address has a sign-in, a reset link is on its way.
      </p>
    );
  }

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    request.mutate(values, {
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["email"] })),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="E-mail" error={formState.errors.email?.message}>
        {(field) => <Input {...field} {...register("email")} type="email" autoComplete="username" inputMode="email" />}
      </FormField>
      <Button type="submit" pending={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
