import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { supportedCurrencies, updateStudioInput, type StudioDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useUpdateStudio } from "../api/update-studio.ts";
import { weekdays } from "./weekdays.ts";

const fields = ["name", "timeZone", "currency", "workweekStartDay", "address", "email", "phone"] as const;

const toFormValues = (studio: StudioDto) => ({
  name: studio.name,
  timeZone: studio.timeZone,
  currency: studio.currency,
  workweekStartDay: studio.workweekStartDay,
  address: studio.address ?? "",
  email: studio.email ?? "",
  phone: studio.phone ?? "",
});

// Offered as suggestions only; the schema is what decides whether a zone is real.
const knownZones = typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : [];

export function StudioSettingsForm({ studio }: { studio: StudioDto }) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm({
    resolver: zodResolver(updateStudioInput),
    defaultValues: toFormValues(studio),
  });
  const update = useUpdateStudio();

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    update.mutate(values, {
      onSuccess: (saved) => {
        reset(toFormValues(saved));
        toast("Studio settings saved");
      },
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields })),
    });
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-2xl flex-col gap-5">
      <FormAlert message={formError} />
      <FormField label="Studio name" error={errors.name?.message}>
        {(field) => <Input {...field} {...register("name")} autoComplete="organization" />}
      </FormField>
      <div className="grid gap-5 sm:grid-cols-2">
        <FormField label="Time zone" hint="For example America/Chicago or Europe/Lisbon." error={errors.timeZone?.message}>
          {(field) => <Input {...field} {...register("timeZone")} list="studio-time-zones" spellCheck={false} />}
        </FormField>
        <datalist id="studio-time-zones">
          {knownZones.map((zone) => (
            <option key={zone} value={zone} />
          ))}
        </datalist>
        <FormField label="Currency" error={errors.currency?.message}>
          {(field) => (
            <Select {...field} {...register("currency")}>
              {supportedCurrencies.map((code) => (
                <option key={code} value={code}>
                  {code}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Workweek starts on" error={errors.workweekStartDay?.message}>
          {(field) => (
            <Select {...field} {...register("workweekStartDay", { valueAsNumber: true })}>
              {weekdays.map((day) => (
                <option key={day.value} value={day.value}>
                  {day.label}
                </option>
              ))}
            </Select>
          )}
        </FormField>
      </div>
      <FormField label="Address" optional error={errors.address?.message}>
        {(field) => <Textarea {...field} {...register("address")} autoComplete="street-address" />}
      </FormField>
      <div className="grid gap-5 sm:grid-cols-2">
        <FormField label="E-mail" optional error={errors.email?.message}>
          {(field) => <Input {...field} {...register("email")} type="email" autoComplete="email" />}
        </FormField>
        <FormField label="Phone" optional error={errors.phone?.message}>
          {(field) => <Input {...field} {...register("phone")} type="tel" autoComplete="tel" />}
        </FormField>
      </div>
      <div>
        <Button type="submit" pending={update.isPending}>
          Save settings
        </Button>
      </div>
    </form>
  );
}
