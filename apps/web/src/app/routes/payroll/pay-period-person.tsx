import { Link, useParams } from "react-router";
import { formatMoney, type PayPeriodReviewDto, type StudioDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { usePayPeriod } from "../../../features/payroll/api/get-pay-period.ts";
import { formatDecimalHours } from "../../../features/payroll/components/hours.ts";
import { formatPeriod, paidDays } from "../../../features/payroll/components/period-format.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useTimeEntries } from "../../../features/time-clock/api/get-time-entries.ts";
import { TimesheetCards, TimesheetTable } from "../../../features/time-clock/components/timesheet-table.tsx";
import { useWideScreen } from "../../../features/time-clock/components/use-wide-screen.ts";
import { ApiError } from "../../../lib/api-client.ts";
import { formatDayShort } from "../../../lib/studio-time.ts";
import { NotFoundRoute } from "../not-found.tsx";

/** One person's entries behind a period's figures: where every number on the review comes from. */
export function PayPeriodPersonPage() {
  const { periodId, staffUserId } = useParams();
  const id = Number(periodId);
  if (!Number.isSafeInteger(id) || id <= 0 || !staffUserId) return <NotFoundRoute />;
  return <Loader id={id} staffUserId={staffUserId} />;
}

function Loader({ id, staffUserId }: { id: number; staffUserId: string }) {
  const review = usePayPeriod(id);
  const studio = useStudio();
  if (review.isPending || studio.isPending) return <LoadingState />;
  if (review.isError) {
    if (review.error instanceof ApiError && review.error.status === 404) return <NotFoundRoute />;
    return <ErrorState error={review.error} onRetry={() => void review.refetch()} />;
  }
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;
  return <PersonView review={review.data} studio={studio.data} staffUserId={staffUserId} />;
}

function PersonView({ review, studio, staffUserId }: { review: PayPeriodReviewDto; studio: StudioDto; staffUserId: string }) {
  const { period } = review;
  const person = review.staff.find((s) => s.staffUserId === staffUserId);
  const days = paidDays(period.startDate, period.endDate, studio.workweekStartDay);
  const entries = useTimeEntries({ ...days, staffUserId });
  const wide = useWideScreen();
  const label = formatPeriod(period.startDate, period.endDate);
  const name = person?.name ?? entries.data?.[0]?.staffName ?? "Time entries";
  const money = (cents: number) => formatMoney(cents, studio.currency);
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.payPeriods.detail.getHref(period.id)} className="font-medium text-muted underline-offset-2 hover:text-ink hover:underline">
          ← Pay period {label}
        </Link>
      </p>
      <PageHeader
        title={`${name}, ${label}`}
        description={`Every entry from ${formatDayShort(days.from)} to ${formatDayShort(days.to)}, the workweeks this period pays. Times are studio time (${studio.timeZone}), as clocked; the figures are after punch rounding.`}
      />
      {person ? (
        <dl className="mb-6 grid grid-cols-2 gap-x-6 gap-y-2 rounded-lg border border-line bg-card px-4 py-3 text-sm tabular-nums sm:grid-cols-5">
          <Figure label="Regular" value={formatDecimalHours(person.regularMinutes)} />
          <Figure label="Overtime" value={formatDecimalHours(person.overtimeMinutes)} />
          <Figure label="Double time" value={formatDecimalHours(person.doubleTimeMinutes)} />
          <Figure label="Total hours" value={formatDecimalHours(person.workedMinutes)} />
          <Figure label="Gross" value={money(person.grossCents)} />
        </dl>
      ) : (
        <p className="mb-6 text-sm text-muted">No paid time for this person in the period.</p>
      )}
      {entries.isPending ? (
        <LoadingState label="Loading the entries…" />
      ) : entries.isError ? (
        <ErrorState error={entries.error} onRetry={() => void entries.refetch()} />
      ) : (
        wide ? (
          <TimesheetTable entries={entries.data} timeZone={studio.timeZone} emptyMessage="No time entries in this period." />
        ) : (
          <TimesheetCards entries={entries.data} timeZone={studio.timeZone} emptyMessage="No time entries in this period." />
        )
      )}
    </>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-muted">{label}</dt>
      <dd className="font-semibold">{value}</dd>
    </div>
  );
}
