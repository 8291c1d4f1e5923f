import type { CreateClientInput } from "@takeup/domain";
import { useFieldArray, useWatch, type UseFormReturn } from "react-hook-form";
import { Button } from "../../../components/ui/button.tsx";
import { FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { emptyContact, type ClientFormValues } from "./client-form-values.ts";

const maxContacts = 20;

type ContactsFieldsProps = { form: UseFormReturn<ClientFormValues, unknown, CreateClientInput> };

export function ContactsFields({ form }: ContactsFieldsProps) {
  const { control, register, setValue, formState } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "contacts" });
  const contacts = useWatch({ control, name: "contacts" }) ?? [];
  const errors = formState.errors.contacts;

  // One primary at a time: choosing a row clears the others.
  const makePrimary = (index: number) => {
    fields.forEach((_, i) => setValue(`contacts.${i}.isPrimary`, i === index, { shouldDirty: true }));
  };

  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="text-sm font-semibold">Contacts</legend>
      <p className="-mt-1 text-sm text-muted">People at the client you deal with. The primary contact is shown in lists.</p>
      {fields.length === 0 ? <p className="text-sm text-muted">No contacts yet.</p> : null}
      {fields.map((field, index) => (
        <div key={field.id} className="rounded-md border border-line bg-paper/60 p-3">
          <div className="grid gap-3 sm:grid-cols-2">
            <FormField label="Contact name" error={errors?.[index]?.name?.message}>
              {(control) => <Input {...control} {...register(`contacts.${index}.name`)} autoComplete="off" />}
            </FormField>
            <FormField label="Contact e-mail" optional error={errors?.[index]?.email?.message}>
              {(control) => <Input {...control} {...register(`contacts.${index}.email`)} type="email" autoComplete="off" />}
            </FormField>
            <FormField label="Contact phone" optional error={errors?.[index]?.phone?.message}>
              {(control) => <Input {...control} {...register(`contacts.${index}.phone`)} type="tel" autoComplete="off" />}
            </FormField>
            <FormField label="Contact note" optional error={errors?.[index]?.note?.message}>
              {(control) => <Input {...control} {...register(`contacts.${index}.note`)} autoComplete="off" />}
            </FormField>
          </div>
          <div className="mt-3 flex items-center justify-between gap-3">
            <label className="flex items-center gap-2 text-sm">
              <input
                type="radio"
                name="primary-contact"
                className="size-4 accent-rust"
                checked={contacts[index]?.isPrimary === true}
                onChange={() => makePrimary(index)}
              />
              Primary contact
            </label>
            <Button variant="ghost" size="sm" onClick={() => remove(index)} aria-label={`Remove contact ${index + 1}`}>
              Remove
            </Button>
          </div>
        </div>
      ))}
      {errors?.message ? <p className="text-sm font-medium text-alert">{errors.message}</p> : null}
      <div>
        <Button
          variant="secondary"
          size="sm"
          onClick={() => append(emptyContact(fields.length === 0))}
          disabled={fields.length >= maxContacts}
        >
          Add a contact
        </Button>
      </div>
    </fieldset>
  );
}
