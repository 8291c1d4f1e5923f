import { Link, useSearchParams } from "react-router";
import { ageingBucketLabels, ageingBuckets, formatMoney } from "@takeup/domain";
import { Input } from "../../../components/ui/input.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useAgeing } from "../../../features/invoices/api/invoices.ts";

/** Open balances by days past due, as of any date. */
export function ReceivablesRoute() {
  const [search, setSearch] = useSearchParams();
  const asOf = search.get("asOf") ?? new Date().toISOString().slice(0, 10);
  const ageing = useAgeing(asOf);

  return (
    <>
      <PageHeader title="Accounts-receivable ageing" description="What clients owe, by how long it is past due." />
      <label className="mb-4 flex max-w-xs flex-col gap-1 text-sm font-semibold">
        As of
        <Input type="date" value={asOf} onChange={(e) => e.target.value && setSearch({ asOf: e.target.value })} />
      </label>
      {ageing.isPending ? (
        <LoadingState />
      ) : ageing.isError ? (
        <ErrorState error={ageing.error} onRetry={() => void ageing.refetch()} />
      ) : (
        <div className="overflow-x-auto rounded-lg border border-line bg-card">
          <table className="w-full text-sm tabular-nums" aria-label="Ageing">
            <thead className="bg-paper-deep/60 text-left text-xs text-muted">
              <tr>
                <th className="px-3 py-2">Invoice</th>
                <th className="px-3 py-2">Client</th>
                <th className="px-3 py-2">Due</th>
                {ageingBuckets.map((b) => (
                  <th key={b} className="px-3 py-2 text-right">
                    {ageingBucketLabels[b]}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {ageing.data.invoices.map((i) => (
                <tr key={i.id} className="border-t border-line">
                  <td className="px-3 py-1.5">
                    <Link className="text-rust-deep underline-offset-2 hover:underline" to={paths.invoices.detail.getHref(i.id)}>
                      {i.number}
                    </Link>
                  </td>
                  <td className="px-3 py-1.5">{i.clientName}</td>
                  <td className="px-3 py-1.5">{i.dueAt}</td>
                  {ageingBuckets.map((b) => (
                    <td key={b} className="px-3 py-1.5 text-right">
                      {i.bucket === b ? formatMoney(i.balanceCents, i.currency) : ""}
                    </td>
                  ))}
                </tr>
              ))}
              <tr className="border-t-2 border-line-strong font-semibold">
                <td className="px-3 py-2" colSpan={3}>
                  Total {formatMoney(ageing.data.totals.totalMinor ?? 0, ageing.data.currency)}
                </td>
                {ageingBuckets.map((b) => (
                  <td key={b} className="px-3 py-2 text-right">
                    {formatMoney(ageing.data.totals[b] ?? 0, ageing.data.currency)}
                  </td>
                ))}
              </tr>
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
