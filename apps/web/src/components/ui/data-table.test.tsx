import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { DataTable, type ColumnDef } from "./data-table.tsx";

type Row = { name: string; room: string; hours: number };

const columns: ColumnDef<Row>[] = [
  { id: "name", header: "Name", accessorFn: (r) => r.name },
  { id: "room", header: "Room", accessorFn: (r) => r.room },
  { id: "hours", header: "Hours", accessorFn: (r) => r.hours },
];

const rows: Row[] = [
  { name: "Sam Reyes", room: "Room B", hours: 6 },
  { name: "Jo Kettering", room: "Room A", hours: 12 },
  { name: "Priya Oduya", room: "Room A", hours: 9 },
];

const firstColumn = () =>
  within(screen.getByRole("table", { name: "Engineers" }))
    .getAllByRole("row")
    .slice(1)
    .map((row) => within(row).getAllByRole("cell")[0]?.textContent);

describe("DataTable", () => {
  it("sorts by a column when its header is clicked, and reverses on a second click", async () => {
    const user = userEvent.setup();
    render(<DataTable label="Engineers" data={rows} columns={columns} />);

    await user.click(screen.getByRole("button", { name: "Name" }));
    expect(firstColumn()).toEqual(["Jo Kettering", "Priya Oduya", "Sam Reyes"]);
    expect(screen.getByRole("columnheader", { name: "Name" })).toHaveAttribute("aria-sort", "ascending");

    await user.click(screen.getByRole("button", { name: "Name" }));
    expect(firstColumn()).toEqual(["Sam Reyes", "Priya Oduya", "Jo Kettering"]);
    expect(screen.getByRole("columnheader", { name: "Name" })).toHaveAttribute("aria-sort", "descending");
  });

  it("keeps only the rows that match the filter box", async () => {
    const user = userEvent.setup();
    render(<DataTable label="Engineers" data={rows} columns={columns} filterLabel="Filter engineers" />);

    await user.type(screen.getByLabelText("Filter engineers"), "room a");
    expect(firstColumn()).toEqual(["Jo Kettering", "Priya Oduya"]);

    await user.clear(screen.getByLabelText("Filter engineers"));
    await user.type(screen.getByLabelText("Filter engineers"), "nobody");
    expect(screen.getByText("Nothing matches “nobody”.")).toBeInTheDocument();
  });

  it("pages through long lists", async () => {
    const user = userEvent.setup();
    const many = Array.from({ length: 30 }, (_, i) => ({ name: `Take ${String(i + 1).padStart(2, "0")}`, room: "Room A", hours: i }));
    render(<DataTable label="Engineers" data={many} columns={columns} pageSize={25} initialSorting={[{ id: "name", desc: false }]} />);

    expect(firstColumn()).toHaveLength(25);
    expect(screen.getByText("Showing 1–25 of 30")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Next" }));
    expect(firstColumn()).toEqual(["Take 26", "Take 27", "Take 28", "Take 29", "Take 30"]);
    expect(screen.getByText("Page 2 of 2")).toBeInTheDocument();
  });
});
