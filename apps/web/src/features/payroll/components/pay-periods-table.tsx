import { useMemo } from "react";
import { Link, useNavigate } from "react-router";
import type { PayPeriodDto } from "@takeup/domain";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { formatStudioDayTime } from "../../../lib/studio-time.ts";
import { paths } from "../../../config/paths.ts";
import { formatPeriod, payPeriodKindLabels } from "./period-format.ts";
import { PeriodStatusBadge, periodStatusLabels } from "./period-status.tsx";

type PayPeriodsTableProps = { periods: PayPeriodDto[]; timeZone: string };

/** Who moved a period on, and when: "Theo Vance, Mon 7 Dec, 10:00". */
function ByWhom({ name, at, timeZone }: { name: string | null; at: string | null; timeZone: string }) {
  if (!name) return <span className="text-muted">—</span>;
  return (
    <span className="flex flex-col leading-tight">
      <span>{name}</span>
      {at ? <span className="text-xs text-muted">{formatStudioDayTime(at, timeZone)}</span> : null}
    </span>
  );
}

export function PayPeriodsTable({ periods, timeZone }: PayPeriodsTableProps) {
  const navigate = useNavigate();
  const columns = useMemo<ColumnDef<PayPeriodDto>[]>(
    () => [
      {
        id: "period",
        header: "Period",
        accessorFn: (p) => p.startDate,
        cell: ({ row }) => (
          <Link to={paths.payPeriods.detail.getHref(row.original.id)} className="font-semibold text-rust-deep underline-offset-2 hover:underline">
            {formatPeriod(row.original.startDate, row.original.endDate)}
          </Link>
        ),
      },
      { id: "kind", header: "Kind", accessorFn: (p) => payPeriodKindLabels[p.kind] },
      {
        id: "status",
        header: "Status",
        accessorFn: (p) => periodStatusLabels[p.status],
        cell: ({ row }) => <PeriodStatusBadge status={row.original.status} />,
      },
      {
        id: "approved",
        header: "Approved by",
        accessorFn: (p) => p.approvedByName ?? "",
        cell: ({ row }) => <ByWhom name={row.original.approvedByName} at={row.original.approvedAt} timeZone={timeZone} />,
      },
      {
        id: "locked",
        header: "Locked by",
        accessorFn: (p) => p.lockedByName ?? "",
        cell: ({ row }) => <ByWhom name={row.original.lockedByName} at={row.original.lockedAt} timeZone={timeZone} />,
      },
    ],
    [timeZone],
  );
  return (
    <DataTable
      label="Pay periods"
      data={periods}
      columns={columns}
      getRowId={(p) => String(p.id)}
      emptyMessage="No pay periods yet."
      hideFilter
      onRowClick={(p) => void navigate(paths.payPeriods.detail.getHref(p.id))}
    />
  );
}
