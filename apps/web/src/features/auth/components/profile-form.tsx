import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { updateMeInput, type MeDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useUpdateMe } from "../api/update-me.ts";

/** One's own name, as the studio sees it (staff also see a client user's client account beside it). */
export function ProfileForm({ me }: { me: MeDto }) {
  const [formError, setFormError] = useState<string | null>(null);
  const toast = useToast();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(updateMeInput),
    defaultValues: { name: me.name },
  });
  const update = useUpdateMe();

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    update.mutate(values, {
      onSuccess: () => toast("Your name is saved"),
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["name"] })),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-md flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="Your name" error={formState.errors.name?.message}>
        {(field) => <Input {...field} {...register("name")} autoComplete="name" maxLength={100} />}
      </FormField>
      <p className="text-sm text-muted">Signed in as {me.email}.</p>
      <Button type="submit" pending={update.isPending} className="self-start">
        Save
      </Button>
    </form>
  );
}
