import { useState } from "react";
import { useFieldArray, useForm, useWatch, type Control } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { supportedCurrencies, updateStudioInput, type StudioDto, type UpdateStudioInput } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { bpToPercent, percentToBp } from "../../../lib/units.ts";
import { useUpdateStudio } from "../api/update-studio.ts";
import { Link } from "react-router";
import { paths } from "../../../config/paths.ts";
import { weekdays } from "../../../lib/weekdays.ts";

const maxTiers = 6;

// The form asks for percent; the contract keeps basis points. Same limits, in the form's units.
const settingsForm = updateStudioInput.omit({ holdHours: true, depositBp: true, cancellationTiers: true }).extend({
  holdHours: z.number("Enter the hours").int("Use whole hours").min(1, "A hold lasts at least an hour").max(24 * 60, "Keep holds under 60 days"),
  depositPercent: z.number("Enter a percentage").min(0, "Use 0 for no deposit").max(100, "A deposit is at most 100%"),
  cancellationTiers: z
    .array(
      z.strictObject({
        noticeUnderHours: z.number("Enter the hours").int("Use whole hours").min(1, "At least one hour").max(24 * 365),
        feePercent: z.number("Enter a percentage").min(0).max(100, "A fee is at most 100%"),
      }),
    )
    .max(maxTiers, "Keep to six tiers"),
});
type SettingsFormInput = z.input<typeof settingsForm>;
type SettingsFormValues = z.output<typeof settingsForm>;

const fields = [
  "name",
  "timeZone",
  "currency",
  "address",
  "email",
  "phone",
  "holdHours",
  "depositPercent",
  "cancellationTiers",
] as const;

const toFormValues = (studio: StudioDto): SettingsFormInput => ({
  name: studio.name,
  timeZone: studio.timeZone,
  currency: studio.currency,
  address: studio.address ?? "",
  email: studio.email ?? "",
  phone: studio.phone ?? "",
  holdHours: studio.holdHours,
  depositPercent: bpToPercent(studio.depositBp),
  cancellationTiers: studio.cancellationTiers.map((tier) => ({ noticeUnderHours: tier.noticeUnderHours, feePercent: bpToPercent(tier.feeBp) })),
});

const toInput = ({ depositPercent, cancellationTiers, ...rest }: SettingsFormValues): UpdateStudioInput => ({
  ...rest,
  depositBp: percentToBp(depositPercent),
  cancellationTiers: cancellationTiers.map((tier) => ({ noticeUnderHours: tier.noticeUnderHours, feeBp: percentToBp(tier.feePercent) })),
});

/** The API names the basis-point fields; the form shows them as percent fields. */
const fromApiField = (field: string): string => field.replace(/^depositBp$/, "depositPercent").replace(/\.feeBp$/, ".feePercent");

// Offered as suggestions only; the schema is what decides whether a zone is real.
const knownZones = typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : [];

export function StudioSettingsForm({ studio }: { studio: StudioDto }) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState, control } = useForm<SettingsFormInput, unknown, SettingsFormValues>({
    resolver: zodResolver(settingsForm),
    defaultValues: toFormValues(studio),
  });
  const tiers = useFieldArray({ control, name: "cancellationTiers" });
  const update = useUpdateStudio();

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    update.mutate(toInput(values), {
      onSuccess: (saved) => {
        reset(toFormValues(saved));
        toast("Studio settings saved");
      },
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields, fromApiField })),
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
        {/* The workweek decides overtime, so it is changed with the other payroll rules (and audited with them). */}
        <div className="flex flex-col gap-1.5">
          <p className="text-sm font-semibold">Workweek starts on</p>
          <p className="py-2">
            {weekdays.find((day) => day.value === studio.workweekStartDay)?.label}{" "}
            <Link to={paths.payrollSettings.getHref()} className="ml-2 text-sm font-medium text-rust-deep underline-offset-2 hover:underline">
              Change in Payroll settings
            </Link>
          </p>
        </div>
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

      <section aria-labelledby="settings-bookings" className="flex flex-col gap-5 border-t border-line pt-5">
        <div>
          <h2 id="settings-bookings" className="text-lg font-semibold">
            Bookings
          </h2>
          <p className="text-sm text-muted">How long a pencilled hold keeps its slot, what a confirmed booking asks up front, and what late cancelling costs.</p>
        </div>
        <div className="grid gap-5 sm:grid-cols-2">
          <FormField label="Holds last (hours)" hint="A hold lapses this long after it is pencilled, unless confirmed." error={errors.holdHours?.message}>
            {(field) => <Input {...field} {...register("holdHours", { valueAsNumber: true })} type="number" min={1} step={1} inputMode="numeric" />}
          </FormField>
          <FormField label="Deposit (%)" hint="Of the quoted price, asked when a booking is confirmed." error={errors.depositPercent?.message}>
            {(field) => (
              <Input {...field} {...register("depositPercent", { valueAsNumber: true })} type="number" min={0} max={100} step="any" inputMode="decimal" />
            )}
          </FormField>
        </div>
        <fieldset className="flex flex-col gap-3">
          <legend className="text-sm font-semibold">Cancellation fees</legend>
          <p className="-mt-1 text-sm text-muted">
            Cancelling a confirmed booking with less notice than a tier costs that share of the quoted price; the shortest matching tier applies.
            Releasing a hold is always free.
          </p>
          {tiers.fields.length === 0 ? <p className="text-sm text-muted">No cancellation fees: cancelling is free at any notice.</p> : null}
          {tiers.fields.map((tier, index) => (
            <div key={tier.id} className="rounded-md border border-line bg-paper/60 p-3">
              <div className="grid items-start gap-3 sm:grid-cols-[1fr_1fr_auto]">
                <FormField label="Less than (hours' notice)" error={errors.cancellationTiers?.[index]?.noticeUnderHours?.message}>
                  {(field) => (
                    <Input
                      {...field}
                      {...register(`cancellationTiers.${index}.noticeUnderHours`, { valueAsNumber: true })}
                      type="number"
                      min={1}
                      step={1}
                      inputMode="numeric"
                    />
                  )}
                </FormField>
                <FormField label="Fee (%)" error={errors.cancellationTiers?.[index]?.feePercent?.message}>
                  {(field) => (
                    <Input
                      {...field}
                      {...register(`cancellationTiers.${index}.feePercent`, { valueAsNumber: true })}
                      type="number"
                      min={0}
                      max={100}
                      step="any"
                      inputMode="decimal"
                    />
                  )}
                </FormField>
                <Button variant="ghost" size="sm" className="sm:mt-7" onClick={() => tiers.remove(index)} aria-label={`Remove fee tier ${index + 1}`}>
                  Remove
                </Button>
              </div>
              <TierSentence control={control} index={index} />
            </div>
          ))}
          {errors.cancellationTiers?.message ? <p className="text-sm font-medium text-alert">{errors.cancellationTiers.message}</p> : null}
          <div>
            <Button
              variant="secondary"
              size="sm"
              onClick={() => tiers.append({ noticeUnderHours: 24, feePercent: 50 })}
              disabled={tiers.fields.length >= maxTiers}
            >
              Add a fee tier
            </Button>
          </div>
        </fieldset>
      </section>
      <div>
        <Button type="submit" pending={update.isPending}>
          Save settings
        </Button>
      </div>
    </form>
  );
}

/** Reads a tier back in words, so the owner sees what a client will be told. */
function TierSentence({ control, index }: { control: Control<SettingsFormInput, unknown, SettingsFormValues>; index: number }) {
  const tier = useWatch({ control, name: `cancellationTiers.${index}` });
  if (!tier || !Number.isFinite(tier.noticeUnderHours) || !Number.isFinite(tier.feePercent)) return null;
  return (
    <p className="mt-2 text-sm text-muted">
      Less than {tier.noticeUnderHours} hours&apos; notice → {tier.feePercent}% of the quoted price.
    </p>
  );
}
