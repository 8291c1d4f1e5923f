import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signInInput, type MeDto } from "@takeup/domain";
import { Link } from "react-router";
import { paths } from "../../../config/paths.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useSignIn } from "../api/sign-in.ts";

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeDto) => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(signInInput),
    defaultValues: { email: "", password: "" },
  });
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    signIn.mutate(values, {
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["email", "password"] })),
    });
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="E-mail" error={errors.email?.message}>
        {(field) => <Input {...field} {...register("email")} type="email" autoComplete="username" inputMode="email" />}
      </FormField>
      <FormField label="Password" error={errors.password?.message}>
        {(field) => <Input {...field} {...register("password")} type="password" autoComplete="current-password" />}
      </FormField>
      <Button type="submit" pending={signIn.isPending} className="w-full">
        Sign in
      </Button>
      <Link to={paths.forgotPassword.getHref()} className="self-center text-sm font-medium text-rust underline-offset-2 hover:underline">
        Forgot your password?
      </Link>
    </form>
  );
}
