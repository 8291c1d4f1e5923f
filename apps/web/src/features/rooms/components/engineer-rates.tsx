import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { engineerGrades, formatMoney, type EngineerDto, type EngineerRateDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { ApiError } from "../../../lib/api-client.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { formatStudioStamp, studioLocalDateTimeToIso, studioParts } from "../../../lib/studio-time.ts";
import { fromMinorUnits, toMinorUnits } from "../../../lib/units.ts";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useCorrectEngineerRate } from "../api/correct-engineer-rate.ts";
import { useCreateEngineerRate } from "../api/create-engineer-rate.ts";
import { engineerGradeLabels } from "./room-labels.ts";

type Standing = "in_force" | "superseded" | "scheduled";
const standingBadge: Record<Standing, { label: string; tone: "accent" | "muted" | "neutral" }> = {
  in_force: { label: "In force", tone: "accent" },
  superseded: { label: "Superseded", tone: "muted" },
  scheduled: { label: "Scheduled", tone: "neutral" },
};

/** For each grade, and each engineer with a rate of their own, the latest rate that has started is the one billed. */
export function rateStandings(rates: EngineerRateDto[], now = Date.now()): Map<number, Standing> {
  const standings = new Map<number, Standing>();
  const latest = new Map<string, EngineerRateDto>();
  for (const rate of rates) {
    if (Date.parse(rate.effectiveFrom) > now) {
      standings.set(rate.id, "scheduled");
      continue;
    }
    const key = `${rate.grade}:${rate.staffUserId ?? "*"}`;
    const seen = latest.get(key);
    if (!seen || Date.parse(rate.effectiveFrom) > Date.parse(seen.effectiveFrom)) latest.set(key, rate);
  }
  const current = new Set([...latest.values()].map((rate) => rate.id));
  for (const rate of rates) if (!standings.has(rate.id)) standings.set(rate.id, current.has(rate.id) ? "in_force" : "superseded");
  return standings;
}

type EngineerRatesProps = {
  rates: EngineerRateDto[];
  engineers: EngineerDto[];
  currency: string;
  timeZone: string;
  canEdit: boolean;
};

export function EngineerRates({ rates, engineers, currency, timeZone, canEdit }: EngineerRatesProps) {
  const [adding, setAdding] = useState(false);
  const [correcting, setCorrecting] = useState<EngineerRateDto | null>(null);
  const standings = useMemo(() => rateStandings(rates), [rates]);
  const columns = useMemo<ColumnDef<EngineerRateDto>[]>(
    () => [
      {
        id: "who",
        header: "Billed for",
        accessorFn: (r) => r.staffName ?? `Any ${engineerGradeLabels[r.grade].toLowerCase()}`,
        cell: ({ row }) =>
          row.original.staffName ? (
            <span className="font-medium">{row.original.staffName}</span>
          ) : (
            <span>
              Any <span className="lowercase">{engineerGradeLabels[row.original.grade]}</span>
            </span>
          ),
      },
      { id: "grade", header: "Grade", accessorFn: (r) => engineerGradeLabels[r.grade] },
      { id: "rate", header: "Hourly rate", accessorFn: (r) => r.hourlyRateCents, cell: ({ row }) => formatMoney(row.original.hourlyRateCents, currency) },
      {
        id: "from",
        header: "Effective from",
        accessorFn: (r) => r.effectiveFrom,
        cell: ({ row }) => <span className="whitespace-nowrap">{formatStudioStamp(row.original.effectiveFrom, timeZone)}</span>,
      },
      {
        id: "standing",
        header: "Status",
        accessorFn: (r) => standingBadge[standings.get(r.id) ?? "superseded"].label,
        cell: ({ row }) => {
          const badge = standingBadge[standings.get(row.original.id) ?? "superseded"];
          return <Badge tone={badge.tone}>{badge.label}</Badge>;
        },
      },
      ...(canEdit
        ? [
            {
              id: "correct",
              header: () => <span className="sr-only">Correction</span>,
              enableSorting: false,
              cell: ({ row }: { row: { original: EngineerRateDto } }) => (
                <Button variant="secondary" size="sm" onClick={() => setCorrecting(row.original)} aria-label={`Correct: ${rateName(row.original)} from ${formatStudioStamp(row.original.effectiveFrom, timeZone)}`}>
                  Correct
                </Button>
              ),
            } satisfies ColumnDef<EngineerRateDto>,
          ]
        : []),
    ],
    [currency, timeZone, standings, canEdit],
  );

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-muted">What a client pays per hour for engineer time. A rate for one engineer wins over their grade&apos;s rate.</p>
        {canEdit ? (
          <Button variant="secondary" size="sm" onClick={() => setAdding(true)}>
            Add an engineer rate
          </Button>
        ) : null}
      </div>
      <DataTable
        label="Engineer rates"
        filterLabel="Filter engineer rates"
        hideFilter={rates.length < 10}
        data={rates}
        columns={columns}
        getRowId={(r) => String(r.id)}
        initialSorting={[{ id: "from", desc: true }]}
        emptyMessage="No engineer rates yet: engineer time cannot be quoted until there is one per grade."
      />
      {correcting ? <CorrectEngineerRateDialog rate={correcting} currency={currency} timeZone={timeZone} onClose={() => setCorrecting(null)} /> : null}
      {canEdit ? (
        <Dialog open={adding} onClose={() => setAdding(false)} title="Add an engineer rate" size="md">
          <EngineerRateForm engineers={engineers} currency={currency} timeZone={timeZone} onDone={() => setAdding(false)} />
        </Dialog>
      ) : null}
    </div>
  );
}

const rateName = (r: EngineerRateDto) => r.staffName ?? `any ${engineerGradeLabels[r.grade].toLowerCase()}`;

const correctionForm = z.object({
  hourlyRate: z.string().trim().regex(/^\d+(\.\d+)?$/, "Enter an amount such as 45 or 45.50"),
  effectiveFrom: z.string().min(1, "Choose when the rate starts"),
  reason: z.string().trim().min(3, "Say why the rate is corrected").max(500, "Use at most 500 characters"),
});
type CorrectionValues = z.infer<typeof correctionForm>;

/** Replaces a mistaken amount or start, with a reason the activity log keeps; quotes already given keep theirs. */
function CorrectEngineerRateDialog({ rate, currency, timeZone, onClose }: { rate: EngineerRateDto; currency: string; timeZone: string; onClose: () => void }) {
  const toast = useToast();
  const correct = useCorrectEngineerRate();
  const [formError, setFormError] = useState<string | null>(null);
  const start = studioParts(rate.effectiveFrom, timeZone);
  const { register, handleSubmit, setError, formState } = useForm<CorrectionValues>({
    resolver: zodResolver(correctionForm),
    defaultValues: { hourlyRate: fromMinorUnits(rate.hourlyRateCents, currency), effectiveFrom: `${start.date}T${start.time}`, reason: "" },
  });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    const effectiveFrom = studioLocalDateTimeToIso(values.effectiveFrom, timeZone);
    if (!effectiveFrom) {
      setError("effectiveFrom", { message: "Choose when the rate starts" });
      return;
    }
    try {
      const saved = await correct.mutateAsync({ id: rate.id, hourlyRateCents: toMinorUnits(values.hourlyRate, currency) ?? 0, effectiveFrom, reason: values.reason.trim() });
      toast(`Rate for ${rateName(saved)} corrected to ${formatMoney(saved.hourlyRateCents, currency)} an hour`);
      onClose();
    } catch (error) {
      const renamed =
        error instanceof ApiError
          ? new ApiError(error.status, error.code, error.message, error.details.map((d) => ({ ...d, field: d.field === "hourlyRateCents" ? "hourlyRate" : d.field })))
          : error;
      setFormError(applyApiErrors(renamed, setError, { fields: ["hourlyRate", "effectiveFrom", "reason"] }));
    }
  });
  const { errors } = formState;
  return (
    <Dialog open onClose={onClose} title="Correct this engineer rate" description={`Billed for ${rateName(rate)}. A mistake only: a new price is a new rate. Bookings already quoted keep their quotes.`} size="sm">
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <FormField label="Hourly rate" hint={`${currency} per hour billed to the client.`} error={errors.hourlyRate?.message}>
          {(field) => <Input {...field} {...register("hourlyRate")} inputMode="decimal" autoComplete="off" />}
        </FormField>
        <FormField label="Effective from" hint="Studio time." error={errors.effectiveFrom?.message}>
          {(field) => <Input {...field} {...register("effectiveFrom")} type="datetime-local" step={60} />}
        </FormField>
        <FormField label="Reason" hint="Kept in the activity log" error={errors.reason?.message}>
          {(field) => <Textarea {...field} {...register("reason")} rows={2} />}
        </FormField>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" pending={formState.isSubmitting}>
            Save correction
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

const rateForm = z.object({
  grade: z.enum(engineerGrades, "Choose engineer or assistant"),
  staffUserId: z.string(),
  hourlyRate: z.string().trim().regex(/^\d+(\.\d+)?$/, "Enter an amount such as 45 or 45.50"),
  effectiveFrom: z.string(),
});
type RateFormValues = z.infer<typeof rateForm>;

function EngineerRateForm({ engineers, currency, timeZone, onDone }: { engineers: EngineerDto[]; currency: string; timeZone: string; onDone: () => void }) {
  const toast = useToast();
  const create = useCreateEngineerRate();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, watch } = useForm<RateFormValues>({
    resolver: zodResolver(rateForm),
    defaultValues: { grade: "engineer", staffUserId: "", hourlyRate: "", effectiveFrom: "" },
  });
  const grade = watch("grade");

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    const effectiveFrom = values.effectiveFrom ? studioLocalDateTimeToIso(values.effectiveFrom, timeZone) : null;
    try {
      const saved = await create.mutateAsync({
        grade: values.grade,
        hourlyRateCents: toMinorUnits(values.hourlyRate, currency) ?? 0,
        ...(values.staffUserId ? { staffUserId: values.staffUserId } : {}),
        ...(effectiveFrom ? { effectiveFrom } : {}),
      });
      toast(`${saved.staffName ?? engineerGradeLabels[saved.grade]} rate saved`);
      onDone();
    } catch (error) {
      const renamed =
        error instanceof ApiError
          ? new ApiError(error.status, error.code, error.message, error.details.map((d) => ({ ...d, field: d.field === "hourlyRateCents" ? "hourlyRate" : d.field })))
          : error;
      setFormError(applyApiErrors(renamed, setError, { fields: ["grade", "staffUserId", "hourlyRate", "effectiveFrom"] }));
    }
  });

  const { errors } = formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="Grade" error={errors.grade?.message}>
        {(field) => (
          <Select {...field} {...register("grade")}>
            {engineerGrades.map((g) => (
              <option key={g} value={g}>
                {engineerGradeLabels[g]}
              </option>
            ))}
          </Select>
        )}
      </FormField>
      <FormField label="Engineer" hint="Leave as the whole grade, or pick one person billed at their own rate." error={errors.staffUserId?.message}>
        {(field) => (
          <Select {...field} {...register("staffUserId")}>
            <option value="">Everyone of this grade</option>
            {engineers
              .filter((e) => e.grade === grade)
              .map((e) => (
                <option key={e.userId} value={e.userId}>
                  {e.name}
                </option>
              ))}
          </Select>
        )}
      </FormField>
      <FormField label="Hourly rate" hint={`${currency} per hour billed to the client.`} error={errors.hourlyRate?.message}>
        {(field) => <Input {...field} {...register("hourlyRate")} inputMode="decimal" autoComplete="off" />}
      </FormField>
      <FormField label="Effective from" optional hint="Studio time. Leave empty to start now." error={errors.effectiveFrom?.message}>
        {(field) => <Input {...field} {...register("effectiveFrom")} type="datetime-local" step={60} />}
      </FormField>
      <p className="text-sm text-muted">Bookings already made keep the engineer rates they were quoted at.</p>
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={formState.isSubmitting}>
          Save rate
        </Button>
      </DialogActions>
    </form>
  );
}
