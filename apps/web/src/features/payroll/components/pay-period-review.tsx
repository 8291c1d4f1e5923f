import type { ReactNode } from "react";
import { Link } from "react-router";
import { formatMoney, overtimeRuleSetLabels, punchRoundingLabels, type PayPeriodReviewDto, type PayPeriodStaffDto, type Role } from "@takeup/domain";
import { Card } from "../../../components/ui/card.tsx";
import { cx } from "../../../lib/cx.ts";
import { formatDayShort } from "../../../lib/studio-time.ts";
import { flagLabels } from "../../../components/ui/entry-flags.tsx";
import { inStudioTime } from "../../../lib/studio-message.ts";
import { canExportPayroll } from "../../../config/access.ts";
import { paths } from "../../../config/paths.ts";
import { ExportDownloads } from "./export-downloads.tsx";
import { formatDecimalHours } from "./hours.ts";
import { PeriodActions } from "./period-actions.tsx";
import { formatPeriod, formatWhen, payPeriodKindLabels } from "./period-format.ts";
import { PeriodStatusBadge } from "./period-status.tsx";

type PayPeriodReviewProps = { review: PayPeriodReviewDto; role: Role; currency: string };

/** A pay period laid out to be checked against its export: rules, flags, then one row per person and the totals. */
export function PayPeriodReview({ review, role, currency }: PayPeriodReviewProps) {
  const { period, settings } = review;
  const timeZone = settings.timeZone;
  const label = formatPeriod(period.startDate, period.endDate);
  return (
    <div className="flex flex-col gap-6">
      <section aria-label="Status and actions" className="flex flex-col gap-4 rounded-lg border border-line bg-card px-4 py-4 lg:flex-row lg:items-start lg:justify-between">
        <div className="flex min-w-0 flex-col gap-1.5">
          <p className="flex flex-wrap items-center gap-2">
            <PeriodStatusBadge status={period.status} />
            <span className="text-sm text-muted">{payPeriodKindLabels[period.kind]}</span>
          </p>
          <StatusLine review={review} timeZone={timeZone} />
          <dl className="mt-1 grid gap-x-4 gap-y-0.5 text-sm sm:grid-cols-[max-content_1fr]">
            <dt className="font-semibold">Overtime rules</dt>
            <dd className="text-muted">{overtimeRuleSetLabels[settings.overtimeRules]}</dd>
            <dt className="font-semibold">Round punches</dt>
            <dd className="text-muted">{punchRoundingLabels[settings.punchRounding]}</dd>
            <dt className="font-semibold">Studio time</dt>
            <dd className="text-muted">{timeZone}</dd>
          </dl>
        </div>
        <div className="flex shrink-0 flex-col gap-3 lg:items-end">
          <PeriodActions period={period} role={role} label={label} />
          {canExportPayroll(role) ? <ExportDownloads periodId={period.id} /> : null}
        </div>
      </section>
      <Flags flags={review.flags} timeZone={timeZone} />
      <StaffTable periodId={review.period.id} staff={review.staff} currency={currency} />
      <StraddlingWeeks staff={review.staff} />
    </div>
  );
}

function StatusLine({ review, timeZone }: { review: PayPeriodReviewDto; timeZone: string }) {
  const { period } = review;
  if (period.status === "locked") {
    return (
      <p className="font-semibold">
        Locked by {period.lockedByName ?? "someone"}
        {period.lockedAt ? ` on ${formatWhen(period.lockedAt, timeZone)}` : ""}. Its time cannot change; only the owner can unlock it.
      </p>
    );
  }
  if (period.status === "approved") {
    return (
      <p className="font-semibold">
        Approved by {period.approvedByName ?? "someone"}
        {period.approvedAt ? ` on ${formatWhen(period.approvedAt, timeZone)}` : ""}. Lock it once payroll is done.
      </p>
    );
  }
  return <p className="font-semibold">Open: time in this period can still change. Approve it once the flags below are dealt with.</p>;
}

function Flags({ flags, timeZone }: { flags: PayPeriodReviewDto["flags"]; timeZone: string }) {
  return (
    <Card title={flags.length === 0 ? "Flags" : `Flags (${flags.length})`}>
      {flags.length === 0 ? (
        <p className="text-sm text-muted">Nothing flagged: no open entries, missing breaks, waiting corrections or missing pay rates.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {flags.map((flag, index) => (
            <li key={`${flag.kind}-${flag.entryId ?? "none"}-${index}`} className="flex flex-col gap-1 text-sm sm:flex-row sm:items-baseline sm:gap-3">
              <span
                className={cx(
                  "inline-flex w-fit shrink-0 items-center rounded-full border px-2 py-0.5 text-xs font-semibold whitespace-nowrap",
                  flag.kind === "open_too_long" || flag.kind === "no_pay_rate" ? "border-alert/40 bg-alert-wash text-alert" : "border-rust/30 bg-rust-wash text-rust-deep",
                )}
              >
                {flagLabels[flag.kind]}
              </span>
              <span className="break-words">{inStudioTime(flag.message, timeZone)}</span>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

type Totals = Pick<
  PayPeriodStaffDto,
  | "workedMinutes"
  | "regularMinutes"
  | "overtimeMinutes"
  | "doubleTimeMinutes"
  | "straightTimeCents"
  | "overtimePremiumCents"
  | "doubleTimePremiumCents"
  | "grossCents"
>;

const totalKeys = [
  "workedMinutes",
  "regularMinutes",
  "overtimeMinutes",
  "doubleTimeMinutes",
  "straightTimeCents",
  "overtimePremiumCents",
  "doubleTimePremiumCents",
  "grossCents",
] as const satisfies readonly (keyof Totals)[];

/** The totals row is the sum of the rows above it (minutes and cents, rounded only for display), as the export's is. */
export function sumStaff(staff: readonly PayPeriodStaffDto[]): Totals {
  const totals = Object.fromEntries(totalKeys.map((key) => [key, 0])) as Totals;
  for (const person of staff) for (const key of totalKeys) totals[key] += person[key];
  return totals;
}

function StaffTable({ periodId, staff, currency }: { periodId: number; staff: PayPeriodStaffDto[]; currency: string }) {
  const money = (cents: number) => formatMoney(cents, currency);
  const totals = sumStaff(staff);
  // Headers wrap onto two lines so all ten columns fit a laptop screen; figures never wrap.
  const th = "px-2.5 py-2 text-right align-bottom font-semibold leading-tight";
  return (
    <section aria-labelledby="period-people" className="flex min-w-0 flex-col gap-2">
      <div>
        <h2 id="period-people" className="text-lg font-semibold">
          Hours and pay per person
        </h2>
        <p className="text-sm text-muted">Decimal hours and amounts as in the export&apos;s Summary sheet. The regular rate shows when a workweek mixed pay rates: it is the
          weighted average that overtime is worked out from. Gross pay is before any tax or deduction.</p>
      </div>
      <div className="relative overflow-x-auto rounded-lg border border-line bg-card">
        <table aria-label="Hours and pay per person" className="w-full border-collapse text-sm tabular-nums">
          <thead className="border-b border-line bg-paper-deep/60 text-xs text-muted">
            <tr>
              <th scope="col" className="px-2.5 py-2 text-left align-bottom font-semibold">
                Name
              </th>
              <th scope="col" className={th}>
                Regular
              </th>
              <th scope="col" className={th}>
                Overtime
              </th>
              <th scope="col" className={th}>
                Double time
              </th>
              <th scope="col" className={th}>
                Total hours
              </th>
              <th scope="col" className={th}>
                Regular rate
              </th>
              <th scope="col" className={th}>
                Straight-time pay
              </th>
              <th scope="col" className={th}>
                Overtime premium
              </th>
              <th scope="col" className={th}>
                Double-time premium
              </th>
              <th scope="col" className={th}>
                Gross
              </th>
            </tr>
          </thead>
          <tbody>
            {staff.length === 0 ? (
              <tr>
                <td colSpan={10} className="px-3 py-8 text-center text-muted">
                  No paid time in this period yet.
                </td>
              </tr>
            ) : (
              staff.map((person) => (
                <tr key={person.staffUserId} className="border-b border-line last:border-b-0">
                  <th scope="row" className="px-2.5 py-2 text-left align-top font-normal">
                    <span className="block font-semibold whitespace-nowrap">
                      <Link
                        to={paths.payPeriods.person.getHref(periodId, person.staffUserId)}
                        className="text-rust-deep underline-offset-2 hover:underline"
                        title={`The entries behind ${person.name}'s figures`}
                      >
                        {person.name}
                      </Link>
                    </span>
                    {person.rates.map((r) => (
                      <span key={`${r.code}-${r.centsPerHour}`} className="block text-xs whitespace-nowrap text-muted">
                        {r.code} {money(r.centsPerHour)}/h
                      </span>
                    ))}
                    <span className="block text-xs whitespace-nowrap text-muted">
                      {person.entryCount} {person.entryCount === 1 ? "entry" : "entries"}
                    </span>
                  </th>
                  <Num>{formatDecimalHours(person.regularMinutes)}</Num>
                  <Num>{formatDecimalHours(person.overtimeMinutes)}</Num>
                  <Num>{formatDecimalHours(person.doubleTimeMinutes)}</Num>
                  <Num strong>{formatDecimalHours(person.workedMinutes)}</Num>
                  <Num>
                    <RegularRate rates={person.regularRates} money={money} />
                  </Num>
                  <Num>{money(person.straightTimeCents)}</Num>
                  <Num>{money(person.overtimePremiumCents)}</Num>
                  <Num>{money(person.doubleTimePremiumCents)}</Num>
                  <Num strong>{money(person.grossCents)}</Num>
                </tr>
              ))
            )}
          </tbody>
          {staff.length > 0 ? (
            <tfoot className="border-t-2 border-line-strong bg-paper-deep/40">
              <tr>
                <th scope="row" className="px-2.5 py-2 text-left font-semibold">
                  Total
                </th>
                <Num strong>{formatDecimalHours(totals.regularMinutes)}</Num>
                <Num strong>{formatDecimalHours(totals.overtimeMinutes)}</Num>
                <Num strong>{formatDecimalHours(totals.doubleTimeMinutes)}</Num>
                <Num strong>{formatDecimalHours(totals.workedMinutes)}</Num>
                <Num>
                  <span className="sr-only">No total</span>
                </Num>
                <Num strong>{money(totals.straightTimeCents)}</Num>
                <Num strong>{money(totals.overtimePremiumCents)}</Num>
                <Num strong>{money(totals.doubleTimePremiumCents)}</Num>
                <Num strong>{money(totals.grossCents)}</Num>
              </tr>
            </tfoot>
          ) : null}
        </table>
      </div>
    </section>
  );
}

/**
 * Workweeks crossing the period's edge: straight time is paid in the period each hour was
 * worked in, overtime in the period holding the week's last day (29 CFR 778.106).
 */
function StraddlingWeeks({ staff }: { staff: PayPeriodStaffDto[] }) {
  const rows = staff.flatMap((person) => person.straddlingWeeks.map((week) => ({ name: person.name, week })));
  if (rows.length === 0) return null;
  return (
    <Card title="Weeks across the period's edge">
      <p className="text-sm text-muted">
        Straight time is paid in the period each hour was worked in; a week&apos;s overtime is only known when the week ends, so it is paid in the period holding the
        week&apos;s last day.
      </p>
      <ul className="mt-2 flex flex-col gap-2 text-sm">
        {rows.map(({ name, week }) => (
          <li key={`${name}-${week.workweekStart}`} className="flex flex-col gap-0.5 sm:flex-row sm:items-baseline sm:gap-3">
            <span className="shrink-0 font-semibold">
              {name} · {week.stillOpen ? "still open at the period's end" : "begun in the previous period"}
            </span>
            <span className="break-words">{week.note}</span>
          </li>
        ))}
      </ul>
    </Card>
  );
}

function Num({ children, strong = false }: { children: ReactNode; strong?: boolean }) {
  return <td className={cx("px-2.5 py-2 text-right align-top whitespace-nowrap", strong && "font-semibold")}>{children}</td>;
}

/** Shown when a workweek mixed pay rates: the weighted average that overtime is worked out from (29 CFR 778.115). */
function RegularRate({ rates, money }: { rates: PayPeriodStaffDto["regularRates"]; money: (cents: number) => string }) {
  const weighted = rates.filter((r) => r.weightedAverage);
  if (weighted.length === 0) {
    return (
      <span className="text-muted">
        —<span className="sr-only">one rate</span>
      </span>
    );
  }
  return (
    <span className="flex flex-col items-end">
      {weighted.map((r) => (
        <span key={r.workweekStart}>
          {money(r.centsPerHour)}
          {weighted.length > 1 || rates.length > 1 ? <span className="text-xs text-muted"> wk of {formatDayShort(r.workweekStart)}</span> : null}
        </span>
      ))}
    </span>
  );
}
