import { routeUrl, tapeMovementLabels, tapeRoutes, type TapeProductDto } from "@takeup/domain";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useTapeMovements } from "../api/get-tape-movements.ts";
import { money } from "./tape-format.ts";

export function MovementHistoryDialog({ product, currency, onClose }: { product: TapeProductDto; currency: string; onClose: () => void }) {
  const movements = useTapeMovements(product.id);
  return (
    <Dialog open onClose={onClose} title={`History of ${product.name}`} size="xl">
      {movements.isPending ? <LoadingState /> : movements.isError ? <ErrorState error={movements.error} onRetry={() => void movements.refetch()} /> : (
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="sr-only">Stock movements, newest first</caption>
            <thead className="text-left text-muted">
              <tr>
                <th className="py-1 pr-3 font-medium">When</th>
                <th className="py-1 pr-3 font-medium">What</th>
                <th className="py-1 pr-3 text-right font-medium">Reels</th>
                <th className="py-1 pr-3 text-right font-medium">Cost</th>
                <th className="py-1 pr-3 text-right font-medium">Sold for</th>
                <th className="py-1 pr-3 text-right font-medium">On hand</th>
                <th className="py-1 pr-3 text-right font-medium">Average</th>
                <th className="py-1 font-medium">Details</th>
              </tr>
            </thead>
            <tbody>
              {movements.data.map((m) => (
                <tr key={m.id} className="border-t border-line">
                  <td className="py-1.5 pr-3 whitespace-nowrap">{m.receivedOn ?? m.createdAt.slice(0, 10)}</td>
                  <td className="py-1.5 pr-3">{tapeMovementLabels[m.kind]}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{m.quantity > 0 ? `+${m.quantity}` : m.quantity}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{money(Math.abs(m.valueChangeCents), currency)}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{m.amountCents === null ? "—" : money(m.amountCents, currency)}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{m.onHandAfter}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{money(m.averageCostAfterCents, currency)}</td>
                  <td className="py-1.5">
                    {[m.supplier, m.clientName, m.projectName, m.reason, `by ${m.createdBy}`].filter(Boolean).join(" · ")}
                    {m.receipt ? (
                      <>
                        {" · "}
                        <a className="text-rust underline" href={routeUrl(tapeRoutes.receipt.path, { id: m.id })}>
                          Receipt
                        </a>
                      </>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </Dialog>
  );
}
