import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canSeeEquipment } from "../../../config/access.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useRecorders } from "../../../features/tape/api/get-customers.ts";
import { useTapeProducts } from "../../../features/tape/api/get-tape-products.ts";
import { TapePlanner } from "../../../features/tape/components/tape-planner.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function TapePlannerRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const products = useTapeProducts();
  const recorders = useRecorders({ enabled: canSeeEquipment(me.role) });
  const header = (
    <PageHeader
      title="Tape planner"
      description="How many reels a project needs: songs and the takes to keep, laid on reels longest first, no take split across two reels."
    />
  );
  const failed = studio.isError ? studio : products.isError ? products : null;
  if (failed) {
    return (
      <>
        {header}
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      </>
    );
  }
  if (!studio.data || !products.data) {
    return (
      <>
        {header}
        <LoadingState />
      </>
    );
  }
  return (
    <>
      {header}
      <TapePlanner products={products.data} recorders={recorders.data ?? []} currency={studio.data.currency} />
    </>
  );
}
