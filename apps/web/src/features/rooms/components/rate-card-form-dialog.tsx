import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import type { CreateRateCardVersionInput, RateCardVersionDto, RoomDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { minuteToTime, studioLocalDateTimeToIso, studioNowLocal, timeToMinute } from "../../../lib/studio-time.ts";
import { bpToPercent, fromMinorUnits, percentToBp, toMinorUnits } from "../../../lib/units.ts";
import { useCreateRateCard } from "../api/create-rate-card.ts";

const money = z.string().trim().regex(/^\d+(\.\d+)?$/, "Enter an amount such as 85 or 85.50");
const time = z.string().refine((value) => timeToMinute(value) !== null, "Enter a time such as 22:00");
const percent = z.number("Enter a percentage, 0 for none").min(0, "Use 0 for none").max(200, "At most 200%");

const rateCardForm = z.object({
  hourlyRate: money,
  dayRate: money,
  dayCoversHours: z.number("Enter the hours").min(1, "A day covers at least an hour").max(24, "A day covers at most 24 hours"),
  minimumHours: z.number("Enter the hours, 0 for none").min(0).max(24, "At most 24 hours"),
  billingIncrementMinutes: z.number("Enter the minutes").int("Use whole minutes").min(1, "At least a minute").max(240, "At most four hours"),
  afterHoursFrom: time,
  afterHoursTo: time,
  afterHoursPremiumPercent: percent,
  weekendPremiumPercent: percent,
  lockoutDayRate: z.string().trim().regex(/^(\d+(\.\d+)?)?$/, "Enter an amount such as 800, or leave it empty for the day rate"),
  lockoutWeekendPremium: z.boolean(),
  effectiveFrom: z.string(),
  note: z.string().trim().max(200, "Use at most 200 characters"),
});
type RateCardFormValues = z.infer<typeof rateCardForm>;

// The API's field names, and where each one sits on this form.
const apiFieldToForm: Record<string, keyof RateCardFormValues> = {
  hourlyRateCents: "hourlyRate",
  dayRateCents: "dayRate",
  dayCoversMinutes: "dayCoversHours",
  minimumBillableMinutes: "minimumHours",
  billingIncrementMinutes: "billingIncrementMinutes",
  afterHoursStartMinute: "afterHoursFrom",
  afterHoursEndMinute: "afterHoursTo",
  afterHoursPremiumBp: "afterHoursPremiumPercent",
  weekendPremiumBp: "weekendPremiumPercent",
  lockoutDayRateCents: "lockoutDayRate",
  lockoutWeekendPremium: "lockoutWeekendPremium",
  effectiveFrom: "effectiveFrom",
  note: "note",
};
const fields = Object.values(apiFieldToForm);

const fromApiField = (field: string): string => apiFieldToForm[field] ?? field;

/** Starts from the prices in force, so the owner changes only what moves. */
function startingValues(current: RateCardVersionDto | null, currency: string, effectiveFrom: string): RateCardFormValues {
  return {
    hourlyRate: current ? fromMinorUnits(current.hourlyRateCents, currency) : "",
    dayRate: current ? fromMinorUnits(current.dayRateCents, currency) : "",
    dayCoversHours: current ? current.dayCoversMinutes / 60 : 10,
    minimumHours: current ? current.minimumBillableMinutes / 60 : 2,
    billingIncrementMinutes: current?.billingIncrementMinutes ?? 30,
    afterHoursFrom: minuteToTime(current?.afterHoursStartMinute ?? 22 * 60),
    afterHoursTo: minuteToTime(current?.afterHoursEndMinute ?? 8 * 60),
    afterHoursPremiumPercent: current ? bpToPercent(current.afterHoursPremiumBp) : 0,
    weekendPremiumPercent: current ? bpToPercent(current.weekendPremiumBp) : 0,
    lockoutDayRate: current?.lockoutDayRateCents != null ? fromMinorUnits(current.lockoutDayRateCents, currency) : "",
    lockoutWeekendPremium: current?.lockoutWeekendPremium ?? false,
    effectiveFrom,
    note: "",
  };
}

/**
 * Dollars, hours and percent as typed, into the cents, minutes and basis points the API keeps.
 * An untouched "Effective from" is left out, so the server starts the version at its own now.
 */
export function toRateCardInput(values: RateCardFormValues, { currency, timeZone, startedAt }: { currency: string; timeZone: string; startedAt: string }): CreateRateCardVersionInput {
  const effectiveFrom = values.effectiveFrom && values.effectiveFrom !== startedAt ? studioLocalDateTimeToIso(values.effectiveFrom, timeZone) : null;
  return {
    hourlyRateCents: toMinorUnits(values.hourlyRate, currency) ?? 0,
    dayRateCents: toMinorUnits(values.dayRate, currency) ?? 0,
    dayCoversMinutes: Math.round(values.dayCoversHours * 60),
    minimumBillableMinutes: Math.round(values.minimumHours * 60),
    billingIncrementMinutes: values.billingIncrementMinutes,
    afterHoursStartMinute: timeToMinute(values.afterHoursFrom) ?? 0,
    afterHoursEndMinute: timeToMinute(values.afterHoursTo) ?? 0,
    afterHoursPremiumBp: percentToBp(values.afterHoursPremiumPercent),
    weekendPremiumBp: percentToBp(values.weekendPremiumPercent),
    lockoutDayRateCents: values.lockoutDayRate ? (toMinorUnits(values.lockoutDayRate, currency) ?? null) : null,
    lockoutWeekendPremium: values.lockoutWeekendPremium,
    ...(effectiveFrom ? { effectiveFrom } : {}),
    ...(values.note ? { note: values.note } : {}),
  };
}

type RateCardFormDialogProps = { open: boolean; onClose: () => void; room: RoomDto; timeZone: string; currency: string };

export function RateCardFormDialog({ open, onClose, room, timeZone, currency }: RateCardFormDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={`New rate card version for ${room.name}`}
      description={`Prices in ${currency}; times are studio time (${timeZone}).`}
      size="lg"
    >
      <RateCardForm room={room} timeZone={timeZone} currency={currency} onDone={onClose} />
    </Dialog>
  );
}

function RateCardForm({ room, timeZone, currency, onDone }: { room: RoomDto; timeZone: string; currency: string; onDone: () => void }) {
  const toast = useToast();
  const create = useCreateRateCard(room.id);
  const [startedAt] = useState(() => studioNowLocal(timeZone));
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<RateCardFormValues>({
    resolver: zodResolver(rateCardForm),
    defaultValues: startingValues(room.currentRateCard, currency, startedAt),
  });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = await create.mutateAsync(toRateCardInput(values, { currency, timeZone, startedAt }));
      toast(`${room.name} rate card version ${saved.version} saved`);
      onDone();
    } catch (error) {
      setFormError(applyApiErrors(error, setError, { fields, fromApiField }));
    }
  });

  const { errors } = formState;
  const number = { type: "number", inputMode: "decimal", step: "any", min: 0 } as const;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="Hourly rate" hint={`${currency} per hour of room time.`} error={errors.hourlyRate?.message}>
          {(field) => <Input {...field} {...register("hourlyRate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <FormField label="Day rate" hint={`${currency} for a full day, when that is cheaper.`} error={errors.dayRate?.message}>
          {(field) => <Input {...field} {...register("dayRate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <FormField label="Day covers (hours)" hint="Hours of one studio day the day rate pays for." error={errors.dayCoversHours?.message}>
          {(field) => <Input {...field} {...register("dayCoversHours", { valueAsNumber: true })} {...number} min={1} max={24} />}
        </FormField>
        <FormField label="Minimum (hours)" hint="Shorter sessions are billed up to this." error={errors.minimumHours?.message}>
          {(field) => <Input {...field} {...register("minimumHours", { valueAsNumber: true })} {...number} max={24} />}
        </FormField>
        <FormField label="Billing increment (minutes)" hint="Time is rounded up to this step." error={errors.billingIncrementMinutes?.message}>
          {(field) => (
            <Input {...field} {...register("billingIncrementMinutes", { valueAsNumber: true })} type="number" inputMode="numeric" step={1} min={1} max={240} />
          )}
        </FormField>
      </div>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold">After hours</legend>
        <FormField label="After-hours from" error={errors.afterHoursFrom?.message}>
          {(field) => <Input {...field} {...register("afterHoursFrom")} type="time" step={60} />}
        </FormField>
        <FormField label="After-hours to" hint="The same time in both means no after-hours window." error={errors.afterHoursTo?.message}>
          {(field) => <Input {...field} {...register("afterHoursTo")} type="time" step={60} />}
        </FormField>
        <FormField label="After-hours premium (%)" hint="Added to room time inside the window." error={errors.afterHoursPremiumPercent?.message}>
          {(field) => <Input {...field} {...register("afterHoursPremiumPercent", { valueAsNumber: true })} {...number} max={200} />}
        </FormField>
        <FormField label="Weekend premium (%)" hint="Added to room time on Saturday and Sunday." error={errors.weekendPremiumPercent?.message}>
          {(field) => <Input {...field} {...register("weekendPremiumPercent", { valueAsNumber: true })} {...number} max={200} />}
        </FormField>
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold">Lockouts</legend>
        <FormField label="Lockout day rate" optional hint={`${currency} for each whole day a client locks the room out; empty means the day rate.`} error={errors.lockoutDayRate?.message}>
          {(field) => <Input {...field} {...register("lockoutDayRate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <label className="flex items-start gap-2 self-end text-sm">
          <input type="checkbox" {...register("lockoutWeekendPremium")} className="mt-0.5 size-4 accent-rust" />
          <span>Add the weekend premium to lockout days on Saturday and Sunday</span>
        </label>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="Effective from" hint="Studio time. Leave it as it is to start the new prices now." error={errors.effectiveFrom?.message}>
          {(field) => <Input {...field} {...register("effectiveFrom")} type="datetime-local" step={60} />}
        </FormField>
        <FormField label="Note" optional error={errors.note?.message}>
          {(field) => <Input {...field} {...register("note")} autoComplete="off" placeholder="e.g. New console fitted" />}
        </FormField>
      </div>
      <p className="rounded-md border border-line bg-paper/60 px-3 py-2 text-sm text-muted">
        Existing bookings keep the prices they were quoted on. This version prices new quotes for sessions from its effective time on; earlier
        versions stay in the history.
      </p>
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={formState.isSubmitting}>
          Save new version
        </Button>
      </DialogActions>
    </form>
  );
}
