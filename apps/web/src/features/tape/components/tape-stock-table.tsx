import { useMemo } from "react";
import type { TapeProductDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { money, percent, productSize } from "./tape-format.ts";

type TapeStockTableProps = {
  products: TapeProductDto[];
  currency: string;
  canMoveStock: boolean;
  onReceive: (p: TapeProductDto) => void;
  onSell: (p: TapeProductDto) => void;
  onHistory: (p: TapeProductDto) => void;
};

export function TapeStockTable({ products, currency, canMoveStock, onReceive, onSell, onHistory }: TapeStockTableProps) {
  const columns = useMemo<ColumnDef<TapeProductDto>[]>(
    () => [
      {
        id: "product",
        header: "Product",
        accessorFn: (p) => `${p.sku} ${p.name}`,
        cell: ({ row }) => (
          <div className="flex flex-col">
            <span className="font-medium">{row.original.name}</span>
            <span className="text-xs text-muted">
              {row.original.sku} · {productSize(row.original)}
            </span>
          </div>
        ),
      },
      { id: "onHand", header: "On hand", accessorFn: (p) => p.onHand, cell: ({ row }) => <span className="tabular-nums">{row.original.onHand}</span> },
      { id: "onOrder", header: "On order", enableSorting: false, cell: () => <span className="text-muted">none</span> },
      { id: "average", header: "Average cost", accessorFn: (p) => p.averageCostCents, cell: ({ row }) => money(row.original.averageCostCents, currency) },
      { id: "value", header: "Value", accessorFn: (p) => p.valueCents, cell: ({ row }) => money(row.original.valueCents, currency) },
      { id: "price", header: "Price", accessorFn: (p) => p.priceCents ?? -1, cell: ({ row }) => money(row.original.priceCents, currency) },
      { id: "margin", header: "Margin", accessorFn: (p) => p.marginBp ?? -1e9, cell: ({ row }) => percent(row.original.marginBp) },
      {
        id: "reorder",
        header: "Reorder",
        accessorFn: (p) => (p.lowStock ? 1 : 0),
        cell: ({ row }) =>
          row.original.lowStock ? <Badge tone="accent">Below {row.original.reorderPoint}: reorder</Badge> : <span className="text-xs text-muted">at {row.original.reorderPoint}</span>,
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <div className="flex justify-end gap-1">
            {canMoveStock ? (
              <>
                <Button variant="ghost" size="sm" aria-label={`Receive ${row.original.name}`} onClick={() => onReceive(row.original)}>
                  Receive
                </Button>
                <Button variant="ghost" size="sm" aria-label={`Sell ${row.original.name}`} onClick={() => onSell(row.original)}>
                  Sell
                </Button>
              </>
            ) : null}
            <Button variant="ghost" size="sm" aria-label={`History of ${row.original.name}`} onClick={() => onHistory(row.original)}>
              History
            </Button>
          </div>
        ),
      },
    ],
    [currency, canMoveStock, onReceive, onSell, onHistory],
  );
  return (
    <DataTable
      label="Tape stock"
      filterLabel="Filter tape products"
      data={products}
      columns={columns}
      getRowId={(p) => String(p.id)}
      initialSorting={[{ id: "product", desc: false }]}
      emptyMessage="No tape products yet."
    />
  );
}
