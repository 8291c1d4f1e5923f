import { formatMoney } from "@takeup/domain";
import { StatCard } from "../../../components/ui/stat-card.tsx";
import { paths } from "../../../config/paths.ts";
import { useAgeing } from "../api/invoices.ts";

const today = () => new Date().toISOString().slice(0, 10);

/** Home card: what clients owe and how much of it is overdue. */
export function MoneyOwedCard() {
  const ageing = useAgeing(today());
  if (!ageing.data) return null;
  const t = ageing.data.totals;
  const overdue = t.totalMinor - t.current;
  return (
    <StatCard
      label="Money owed"
      value={formatMoney(t.totalMinor, ageing.data.currency)}
      detail={`${formatMoney(overdue, ageing.data.currency)} overdue`}
      href={paths.receivables.getHref()}
      linkLabel="Open A/R ageing"
    />
  );
}
