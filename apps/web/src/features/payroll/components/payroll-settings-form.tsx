import { useId, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import {
  overtimeRuleSetLabels,
  overtimeRuleSets,
  payPeriodKinds,
  punchRoundingLabels,
  punchRoundings,
  updatePayrollSettingsInput,
  type PayrollSettingsDto,
} from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { minuteToTime } from "../../../lib/studio-time.ts";
import { weekdays } from "../../../lib/weekdays.ts";
import { useUpdatePayrollSettings } from "../api/update-payroll-settings.ts";
import { payPeriodKindLabels } from "./period-format.ts";

// Every field is required on this form (the contract lets a PATCH leave any out).
const settingsForm = z.object({
  workweekStartDay: z.number().int().min(1).max(7),
  workweekStartHour: z.number().int().min(0).max(23),
  payPeriodKind: z.enum(payPeriodKinds),
  payPeriodAnchor: z.iso.date("Choose the first day of a two-week period"),
  punchRounding: z.enum(punchRoundings),
  overtimeRules: z.enum(overtimeRuleSets),
  roundRegularRateToCent: z.boolean(),
  openEntryLimitHours: z.number("Enter a number of hours").int("Use whole hours").min(4, "At least 4 hours").max(48, "At most 48 hours"),
}) satisfies z.ZodType<Required<z.infer<typeof updatePayrollSettingsInput>>>;
type SettingsValues = z.infer<typeof settingsForm>;

const fields = [
  "workweekStartDay",
  "workweekStartHour",
  "payPeriodKind",
  "payPeriodAnchor",
  "punchRounding",
  "overtimeRules",
  "roundRegularRateToCent",
  "openEntryLimitHours",
] as const;

const toValues = (s: PayrollSettingsDto): SettingsValues => ({
  workweekStartDay: s.workweekStartDay,
  workweekStartHour: s.workweekStartHour,
  payPeriodKind: s.payPeriodKind,
  payPeriodAnchor: s.payPeriodAnchor,
  punchRounding: s.punchRounding,
  overtimeRules: s.overtimeRules,
  roundRegularRateToCent: s.roundRegularRateToCent,
  openEntryLimitHours: s.openEntryLimitHours,
});

const hours = Array.from({ length: 24 }, (_, hour) => hour);

type PayrollSettingsFormProps = { settings: PayrollSettingsDto; canEdit: boolean };

/** The studio's payroll rules. The owner edits; the manager and the bookkeeper read the same form, locked. */
export function PayrollSettingsForm({ settings, canEdit }: PayrollSettingsFormProps) {
  const toast = useToast();
  const checkboxId = useId();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState, control } = useForm<SettingsValues>({
    resolver: zodResolver(settingsForm),
    defaultValues: toValues(settings),
  });
  const kind = useWatch({ control, name: "payPeriodKind" });
  const update = useUpdatePayrollSettings();

  const onSubmit = handleSubmit((values) => {
    if (!canEdit) return;
    setFormError(null);
    update.mutate(values, {
      onSuccess: (saved) => {
        reset(toValues(saved));
        toast("Payroll settings saved");
      },
      onError: (error) => setFormError(applyApiErrors(error, setError, { fields })),
    });
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-2xl flex-col gap-5">
      <FormAlert message={formError} />
      {canEdit ? null : <p className="text-sm font-medium text-muted">Only the owner changes payroll settings; you can read them here.</p>}
      {/* A disabled fieldset makes every control read-only at once, and keeps them readable. */}
      <fieldset disabled={!canEdit} className="flex min-w-0 flex-col gap-5">
        <legend className="sr-only">Payroll settings</legend>
        <section aria-labelledby="settings-workweek" className="flex flex-col gap-4">
          <div>
            <h2 id="settings-workweek" className="text-lg font-semibold">
              Workweek
            </h2>
            <p className="text-sm text-muted">Weekly overtime is counted per workweek: seven days from this day and hour, studio time ({settings.timeZone}).</p>
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
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
            <FormField label="Workweek starts at (hour)" hint="Each workday starts at this hour too." error={errors.workweekStartHour?.message}>
              {(field) => (
                <Select {...field} {...register("workweekStartHour", { valueAsNumber: true })}>
                  {hours.map((hour) => (
                    <option key={hour} value={hour}>
                      {minuteToTime(hour * 60)}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
          </div>
        </section>

        <section aria-labelledby="settings-periods" className="flex flex-col gap-4 border-t border-line pt-5">
          <h2 id="settings-periods" className="text-lg font-semibold">
            Pay schedule
          </h2>
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField label="Pay periods" error={errors.payPeriodKind?.message}>
              {(field) => (
                <Select {...field} {...register("payPeriodKind")}>
                  {payPeriodKinds.map((k) => (
                    <option key={k} value={k}>
                      {payPeriodKindLabels[k]}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
            {kind === "fortnightly" ? (
              <FormField
                label="First day of a two-week period"
                hint="Any past or future period's first day; the others follow every 14 days."
                error={errors.payPeriodAnchor?.message}
              >
                {(field) => <Input {...field} {...register("payPeriodAnchor")} type="date" />}
              </FormField>
            ) : null}
          </div>
          {kind === "semi_monthly" ? (
            <p className="text-sm text-muted">
              Twice a month runs from the 1st to the 15th and from the 16th to the month&apos;s last day. A workweek that crosses into the next period is
              paid whole in the period where it ends.
            </p>
          ) : null}
        </section>

        <section aria-labelledby="settings-rules" className="flex flex-col gap-4 border-t border-line pt-5">
          <h2 id="settings-rules" className="text-lg font-semibold">
            Rounding and overtime
          </h2>
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField
              label="Round punches"
              hint="Clock-in and clock-out times go to the nearest step; breaks stay to the minute."
              error={errors.punchRounding?.message}
              className="sm:col-span-2 sm:max-w-sm"
            >
              {(field) => (
                <Select {...field} {...register("punchRounding")}>
                  {punchRoundings.map((r) => (
                    <option key={r} value={r}>
                      {punchRoundingLabels[r]}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
            <FormField
              label="Overtime rules"
              hint="Daily and weekly: past 8 hours in a workday at 1.5×, past 12 at 2×, past 40 in the workweek at 1.5×, and on a seventh straight workday 1.5× from the start and 2× past 8 hours."
              error={errors.overtimeRules?.message}
              className="sm:col-span-2"
            >
              {(field) => (
                <Select {...field} {...register("overtimeRules")}>
                  {overtimeRuleSets.map((r) => (
                    <option key={r} value={r}>
                      {overtimeRuleSetLabels[r]}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
          </div>
          <div className="flex items-start gap-3 rounded-md border border-line bg-paper/60 p-3">
            <input
              id={checkboxId}
              type="checkbox"
              {...register("roundRegularRateToCent")}
              aria-describedby={`${checkboxId}-hint`}
              className="mt-1 size-4 shrink-0 accent-rust"
            />
            <div>
              <label htmlFor={checkboxId} className="text-sm font-semibold">
                Round the regular rate to the cent before halving
              </label>
              <p id={`${checkboxId}-hint`} className="text-sm text-muted">
                When a week mixes pay rates, the regular rate is their weighted average and the overtime premium is half of it per overtime hour. Ticked,
                that average is first rounded to the cent, as some payroll providers do; left clear, the exact rate is used and only the premium is
                rounded. The two can differ by a few cents.
              </p>
            </div>
          </div>
          <FormField
            label="Flag entries open longer than (hours)"
            hint="An entry still clocked in after this long is flagged on the clock and in the pay period. Nothing is closed or deducted."
            error={errors.openEntryLimitHours?.message}
            className="sm:max-w-xs"
          >
            {(field) => <Input {...field} {...register("openEntryLimitHours", { valueAsNumber: true })} type="number" min={4} max={48} step={1} inputMode="numeric" />}
          </FormField>
        </section>
      </fieldset>
      <p className="rounded-md bg-paper-deep/60 px-3 py-2 text-sm text-muted">
        Changes apply to every pay period that is not locked. Locked periods keep the settings they were locked with.
      </p>
      {canEdit ? (
        <div>
          <Button type="submit" pending={update.isPending}>
            Save payroll settings
          </Button>
        </div>
      ) : null}
    </form>
  );
}
