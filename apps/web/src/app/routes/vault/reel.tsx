import { Link, useParams } from "react-router";
import { formatMoney, reelStatusLabels, type ReelDetailDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { buttonStyles } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { reelLabelHref, useReel } from "../../../features/vault/api/reels.ts";
import { reelFormat } from "../../../features/vault/components/reel-format.ts";
import { ReelMovements } from "../../../features/vault/components/reel-movements.tsx";
import { TrackSheet } from "../../../features/vault/components/track-sheet.tsx";
import { ApiError } from "../../../lib/api-client.ts";
import { NotFoundRoute } from "../not-found.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function ReelRoute() {
  const { reelId } = useParams();
  const id = Number(reelId);
  if (!Number.isSafeInteger(id) || id <= 0) return <NotFoundRoute />;
  return <ReelPage id={id} />;
}

function ReelPage({ id }: { id: number }) {
  const reel = useReel(id);
  if (reel.isPending) return <LoadingState />;
  if (reel.isError) {
    if (reel.error instanceof ApiError && reel.error.status === 404) return <NotFoundRoute />;
    return <ErrorState error={reel.error} onRetry={() => void reel.refetch()} />;
  }
  return <ReelView key={reel.data.id} reel={reel.data} />;
}

function ReelView({ reel }: { reel: ReelDetailDto }) {
  const me = useSignedInUser();
  const studio = useStudio();
  const timeZone = studio.data?.timeZone ?? "UTC";
  const facts: [string, string][] = [
    ["Client", reel.clientName],
    ["Project", reel.projectName ?? "—"],
    ["Format", reelFormat(reel)],
    ["Noise reduction", reel.noiseReduction === "encoded" ? "Encoded (decode on playback)" : "None"],
    ["Reference level", reel.referenceLevel ?? "—"],
    ["Recorded", reel.recordedOn ?? "—"],
    ["Shelf", reel.shelf ?? "—"],
    ["Storage fees from", reel.feesFrom ?? "—"],
  ];
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.vault.list.getHref()} className="font-medium text-muted underline-offset-2 hover:text-ink hover:underline">
          ← {me.role === "client" ? "Your reels" : "Vault"}
        </Link>
      </p>
      <PageHeader
        eyebrow="Reel"
        title={reel.labelId}
        description={reel.contentsNote ?? undefined}
        actions={
          me.role !== "bookkeeper" ? (
            <a href={reelLabelHref(reel.id)} download className={buttonStyles("secondary")}>
              Download box label (PDF)
            </a>
          ) : null
        }
      />
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <div className="flex flex-col gap-4">
          <TrackSheet reel={reel} />
        </div>
        <div className="flex flex-col gap-4">
          <Card title="On the box">
            <p className="mb-2">
              <Badge tone={reel.status === "checked_out" ? "accent" : "neutral"}>{reelStatusLabels[reel.status]}</Badge>
              {reel.dueBack ? <span className="ml-2 text-sm text-muted">due back {reel.dueBack}</span> : null}
            </p>
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
              {facts.map(([term, value]) => (
                <div key={term} className="contents">
                  <dt className="text-muted">{term}</dt>
                  <dd>{value}</dd>
                </div>
              ))}
            </dl>
            {reel.storageCharges.length ? (
              <p className="mt-3 text-sm text-muted">
                Storage charged for {reel.storageCharges.length} {reel.storageCharges.length === 1 ? "month" : "months"}, {formatMoney(reel.storageCharges.reduce((s, c) => s + c.amountCents, 0), studio.data?.currency ?? "USD")} in all.
              </p>
            ) : null}
          </Card>
          <ReelMovements reel={reel} role={me.role} timeZone={timeZone} />
        </div>
      </div>
    </>
  );
}
