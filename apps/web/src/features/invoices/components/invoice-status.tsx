import { invoiceStatusLabels, type InvoiceStatus } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";

export function InvoiceStatusBadge({ status, daysOverdue = 0 }: { status: InvoiceStatus; daysOverdue?: number }) {
  if (daysOverdue > 0) return <Badge tone="accent">{`${invoiceStatusLabels[status]} · ${daysOverdue} d overdue`}</Badge>;
  return <Badge tone={status === "void" || status === "draft" ? "muted" : "neutral"}>{invoiceStatusLabels[status]}</Badge>;
}
