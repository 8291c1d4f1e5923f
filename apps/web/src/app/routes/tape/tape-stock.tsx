import { useCallback, useState } from "react";
import { Link } from "react-router";
import type { TapeProductDto } from "@takeup/domain";
import { buttonStyles, Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canMoveTapeStock } from "../../../config/access.ts";
import { paths } from "../../../config/paths.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useTapeProducts } from "../../../features/tape/api/get-tape-products.ts";
import { CountSheetDialog } from "../../../features/tape/components/count-sheet-dialog.tsx";
import { MovementHistoryDialog } from "../../../features/tape/components/movement-history-dialog.tsx";
import { ReceiveTapeDialog } from "../../../features/tape/components/receive-tape-dialog.tsx";
import { SellTapeDialog } from "../../../features/tape/components/sell-tape-dialog.tsx";
import { TapeStockTable } from "../../../features/tape/components/tape-stock-table.tsx";
import { studioToday } from "../../../lib/studio-time.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

type Open = { kind: "receive" | "sell" | "history"; product: TapeProductDto } | { kind: "count" } | null;

export function TapeStockRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const products = useTapeProducts();
  const [open, setOpen] = useState<Open>(null);
  const close = () => setOpen(null);
  const mover = canMoveTapeStock(me.role);
  const onReceive = useCallback((product: TapeProductDto) => setOpen({ kind: "receive", product }), []);
  const onSell = useCallback((product: TapeProductDto) => setOpen({ kind: "sell", product }), []);
  const onHistory = useCallback((product: TapeProductDto) => setOpen({ kind: "history", product }), []);

  const header = (
    <PageHeader
      title="Tape stock"
      description="Reels on the shelf at their moving-average cost, what they sell for, and what needs reordering."
      actions={
        <>
          <Link className={buttonStyles("secondary")} to={paths.tapePlanner.getHref()}>
            Plan reels
          </Link>
          {mover ? <Button onClick={() => setOpen({ kind: "count" })}>Count sheet</Button> : null}
        </>
      }
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
  const currency = studio.data.currency;
  return (
    <>
      {header}
      <TapeStockTable products={products.data} currency={currency} canMoveStock={mover} onReceive={onReceive} onSell={onSell} onHistory={onHistory} />
      {open?.kind === "receive" ? <ReceiveTapeDialog product={open.product} currency={currency} onClose={close} today={studioToday(studio.data.timeZone)} /> : null}
      {open?.kind === "sell" ? <SellTapeDialog product={open.product} currency={currency} onClose={close} /> : null}
      {open?.kind === "history" ? <MovementHistoryDialog product={open.product} currency={currency} onClose={close} /> : null}
      {open?.kind === "count" ? <CountSheetDialog products={products.data.filter((p) => p.active)} onClose={close} /> : null}
    </>
  );
}
