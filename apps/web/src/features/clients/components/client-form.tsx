import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { clientKindLabels, clientKinds, createClientInput, type CreateClientInput } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import type { ClientFormValues } from "./client-form-values.ts";
import { ContactsFields } from "./contacts-fields.tsx";

const fields = ["name", "kind", "email", "phone", "billingAddress", "notes", "contacts"] as const;

type ClientFormProps = {
  defaultValues: ClientFormValues;
  submitLabel: string;
  onSubmit: (values: CreateClientInput) => Promise<unknown>;
  onCancel: () => void;
};

export function ClientForm({ defaultValues, submitLabel, onSubmit, onCancel }: ClientFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ClientFormValues, unknown, CreateClientInput>({ resolver: zodResolver(createClientInput), defaultValues });
  const { register, handleSubmit, setError, formState } = form;

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await onSubmit(values);
    } catch (error) {
      setFormError(applyApiErrors(error, setError, { fields, codeFields: { client_exists: "name" } }));
    }
  });

  const { errors } = formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <FormField label="Name" error={errors.name?.message}>
          {(field) => <Input {...field} {...register("name")} autoComplete="off" />}
        </FormField>
        <FormField label="Kind" error={errors.kind?.message}>
          {(field) => (
            <Select {...field} {...register("kind")}>
              {clientKinds.map((kind) => (
                <option key={kind} value={kind}>
                  {clientKindLabels[kind]}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="E-mail" optional error={errors.email?.message}>
          {(field) => <Input {...field} {...register("email")} type="email" autoComplete="off" />}
        </FormField>
        <FormField label="Phone" optional error={errors.phone?.message}>
          {(field) => <Input {...field} {...register("phone")} type="tel" autoComplete="off" />}
        </FormField>
      </div>
      <FormField label="Billing address" optional error={errors.billingAddress?.message}>
        {(field) => <Textarea {...field} {...register("billingAddress")} rows={2} />}
      </FormField>
      <FormField label="Notes" optional error={errors.notes?.message}>
        {(field) => <Textarea {...field} {...register("notes")} rows={3} />}
      </FormField>
      <ContactsFields form={form} />
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={formState.isSubmitting}>
          {submitLabel}
        </Button>
      </DialogActions>
    </form>
  );
}
