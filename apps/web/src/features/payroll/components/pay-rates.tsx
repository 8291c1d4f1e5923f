import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { correctPayRateInput, createPayRateInput, formatMoney, roleLabels, type PayRateDto, type StaffMemberDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { formatDayLong, formatDayShort, studioToday } from "../../../lib/studio-time.ts";
import { fromMinorUnits, toMinorUnits } from "../../../lib/units.ts";
import { useCorrectPayRate } from "../api/correct-pay-rate.ts";
import { useCreatePayRate } from "../api/create-pay-rate.ts";

/**
 * Every rate with the date it applies from; a newer row for the same person and code takes over on its date.
 * The owner can correct a rate's amount or date until a locked period has been computed with it.
 */
export function PayRatesTable({ rates, currency, canCorrect = false }: { rates: PayRateDto[]; currency: string; canCorrect?: boolean }) {
  const [correcting, setCorrecting] = useState<PayRateDto | null>(null);
  const columns = useMemo<ColumnDef<PayRateDto>[]>(
    () => [
      { id: "person", header: "Person", accessorFn: (r) => r.staffName, cell: ({ row }) => <span className="font-medium">{row.original.staffName}</span> },
      { id: "code", header: "Code", accessorFn: (r) => r.code },
      { id: "rate", header: "Rate per hour", accessorFn: (r) => r.hourlyRateCents, cell: ({ row }) => formatMoney(row.original.hourlyRateCents, currency) },
      {
        id: "from",
        header: "From",
        accessorFn: (r) => r.effectiveFrom,
        cell: ({ row }) => `${formatDayShort(row.original.effectiveFrom)} ${row.original.effectiveFrom.slice(0, 4)}`,
      },
      ...(canCorrect
        ? [
            {
              id: "correct",
              header: () => <span className="sr-only">Correction</span>,
              enableSorting: false,
              cell: ({ row }: { row: { original: PayRateDto } }) =>
                row.original.usedByLockedPeriod ? (
                  <span className="text-xs text-muted">Used by a locked period</span>
                ) : (
                  <Button variant="secondary" size="sm" onClick={() => setCorrecting(row.original)} aria-label={`Correct: ${row.original.staffName}, ${row.original.code} from ${row.original.effectiveFrom}`}>
                    Correct
                  </Button>
                ),
            } satisfies ColumnDef<PayRateDto>,
          ]
        : []),
    ],
    [currency, canCorrect],
  );
  return (
    <>
      {correcting ? <CorrectPayRateDialog rate={correcting} currency={currency} onClose={() => setCorrecting(null)} /> : null}
      <PayRatesTableBody rates={rates} columns={columns} />
    </>
  );
}

function PayRatesTableBody({ rates, columns }: { rates: PayRateDto[]; columns: ColumnDef<PayRateDto>[] }) {
  return (
    <DataTable
      label="Pay rates"
      filterLabel="Filter pay rates"
      data={rates}
      columns={columns}
      getRowId={(r) => String(r.id)}
      initialSorting={[{ id: "person", desc: false }]}
      emptyMessage="No pay rates yet. Time is only paid once a rate is set."
    />
  );
}

function correctionForm(currency: string) {
  return z.object({
    rate: payRateForm(currency).shape.rate,
    effectiveFrom: z.iso.date("Choose the first day the rate applies"),
    reason: correctPayRateInput.shape.reason,
  });
}
type CorrectionValues = z.infer<ReturnType<typeof correctionForm>>;

/** Replaces a mistaken amount or date, with a reason the activity log keeps. */
function CorrectPayRateDialog({ rate, currency, onClose }: { rate: PayRateDto; currency: string; onClose: () => void }) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const schema = useMemo(() => correctionForm(currency), [currency]);
  const { register, handleSubmit, setError, formState } = useForm<CorrectionValues>({
    resolver: zodResolver(schema),
    defaultValues: { rate: fromMinorUnits(rate.hourlyRateCents, currency), effectiveFrom: rate.effectiveFrom, reason: "" },
  });
  const correct = useCorrectPayRate();
  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    correct.mutate(
      { id: rate.id, hourlyRateCents: toMinorUnits(values.rate, currency) ?? 0, effectiveFrom: values.effectiveFrom, reason: values.reason.trim() },
      {
        onSuccess: (saved) => {
          toast(`${saved.staffName}: ${saved.code} corrected to ${formatMoney(saved.hourlyRateCents, currency)} an hour from ${formatDayLong(saved.effectiveFrom)}`);
          onClose();
        },
        onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["rate", "effectiveFrom", "reason"], fromApiField })),
      },
    );
  });
  const { errors } = formState;
  return (
    <Dialog open onClose={onClose} title="Correct this pay rate" description={`${rate.staffName}, ${rate.code}. A mistake only: a raise is a new rate from a later date.`} size="sm">
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <FormField label="Rate per hour" hint={`In ${currency}`} error={errors.rate?.message}>
          {(field) => <Input {...field} {...register("rate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <FormField label="From" error={errors.effectiveFrom?.message}>
          {(field) => <Input {...field} {...register("effectiveFrom")} type="date" />}
        </FormField>
        <FormField label="Reason" hint="Kept in the activity log" error={errors.reason?.message}>
          {(field) => <Textarea {...field} {...register("reason")} rows={2} />}
        </FormField>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" pending={correct.isPending}>
            Save correction
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

const codeSuggestions = ["engineer", "assistant", "shop"];

function payRateForm(currency: string) {
  return z.object({
    staffUserId: z.string().min(1, "Choose a person"),
    code: createPayRateInput.shape.code,
    rate: z
      .string()
      .trim()
      .min(1, "Enter the rate per hour")
      .refine((value) => toMinorUnits(value, currency) !== null, "Enter an amount such as 28.50")
      .refine((value) => (toMinorUnits(value, currency) ?? 0) <= 1_000_000, "That is more than Takeup can store for an hour"),
    effectiveFrom: z.iso.date("Choose the first day the rate applies"),
  });
}
type PayRateValues = z.infer<ReturnType<typeof payRateForm>>;

/** The API names the cents field; the form shows it as an amount. */
const fromApiField = (field: string): string => (field === "hourlyRateCents" ? "rate" : field);

type PayRateFormProps = { members: StaffMemberDto[]; currency: string; timeZone: string };

/** The owner sets a rate for a person and a kind of work, from a date. */
export function PayRateForm({ members, currency, timeZone }: PayRateFormProps) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const schema = useMemo(() => payRateForm(currency), [currency]);
  const defaultValues = { staffUserId: "", code: "engineer", rate: "", effectiveFrom: studioToday(timeZone) };
  const { register, handleSubmit, setError, reset, formState } = useForm<PayRateValues>({ resolver: zodResolver(schema), defaultValues });
  const create = useCreatePayRate();
  const people = members.filter((m) => m.active).sort((a, b) => a.name.localeCompare(b.name));

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    create.mutate(
      { staffUserId: values.staffUserId, code: values.code.trim(), hourlyRateCents: toMinorUnits(values.rate, currency) ?? 0, effectiveFrom: values.effectiveFrom },
      {
        onSuccess: (rate) => {
          toast(`${rate.staffName}: ${rate.code} at ${formatMoney(rate.hourlyRateCents, currency)} an hour from ${formatDayLong(rate.effectiveFrom)}`);
          reset(defaultValues);
        },
        onError: (error) =>
          setFormError(applyApiErrors(error, setError, { fields: ["staffUserId", "code", "rate", "effectiveFrom"], codeFields: { not_found: "staffUserId" }, fromApiField })),
      },
    );
  });

  const { errors } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <FormField label="Person" error={errors.staffUserId?.message}>
          {(field) => (
            <Select {...field} {...register("staffUserId")}>
              <option value="">Choose…</option>
              {people.map((m) => (
                <option key={m.userId} value={m.userId}>
                  {m.name} ({roleLabels[m.role]})
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Code" hint="engineer, assistant, shop, or your own" error={errors.code?.message}>
          {(field) => <Input {...field} {...register("code")} list="pay-rate-codes" autoCapitalize="none" spellCheck={false} />}
        </FormField>
        <datalist id="pay-rate-codes">
          {codeSuggestions.map((code) => (
            <option key={code} value={code} />
          ))}
        </datalist>
        <FormField label="Rate per hour" hint={`In ${currency}, e.g. 28.50`} error={errors.rate?.message}>
          {(field) => <Input {...field} {...register("rate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <FormField label="From" hint="The first studio day it applies" error={errors.effectiveFrom?.message}>
          {(field) => <Input {...field} {...register("effectiveFrom")} type="date" />}
        </FormField>
      </div>
      <div>
        <Button type="submit" pending={create.isPending}>
          Add pay rate
        </Button>
      </div>
    </form>
  );
}
