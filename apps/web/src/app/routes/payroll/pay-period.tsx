import { Link, useParams } from "react-router";
import type { PayPeriodReviewDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { usePayPeriod } from "../../../features/payroll/api/get-pay-period.ts";
import { PayPeriodReview } from "../../../features/payroll/components/pay-period-review.tsx";
import { PayrollCaution } from "../../../features/payroll/components/payroll-caution.tsx";
import { formatPeriod } from "../../../features/payroll/components/period-format.ts";
import { paths } from "../../../config/paths.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { ApiError } from "../../../lib/api-client.ts";
import { NotFoundRoute } from "../not-found.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function PayPeriodPage() {
  const { periodId } = useParams();
  const id = Number(periodId);
  if (!Number.isSafeInteger(id) || id <= 0) return <NotFoundRoute />;
  return <PayPeriodLoader id={id} />;
}

function PayPeriodLoader({ id }: { id: number }) {
  const review = usePayPeriod(id);
  if (review.isPending) return <LoadingState />;
  if (review.isError) {
    if (review.error instanceof ApiError && review.error.status === 404) return <NotFoundRoute />;
    return <ErrorState error={review.error} onRetry={() => void review.refetch()} />;
  }
  return <PayPeriodView review={review.data} />;
}

function PayPeriodView({ review }: { review: PayPeriodReviewDto }) {
  const me = useSignedInUser();
  const studio = useStudio();
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.payPeriods.list.getHref()} className="font-medium text-muted underline-offset-2 hover:text-ink hover:underline">
          ← All pay periods
        </Link>
      </p>
      <PageHeader title={`Pay period ${formatPeriod(review.period.startDate, review.period.endDate)}`} />
      <PayrollCaution text={review.caution} className="mb-6" />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <PayPeriodReview review={review} role={me.role} currency={studio.data.currency} />
      )}
    </>
  );
}
