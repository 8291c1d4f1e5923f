import { useMemo } from "react";
import { roleLabels, type StaffMemberDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { formatDate } from "../../../lib/dates.ts";
import { MemberRoleSelect } from "./member-role-select.tsx";
import { MemberStatusAction } from "./member-status-action.tsx";

type StaffTableProps = { members: StaffMemberDto[]; currentUserId: string; timeZone?: string };

export function StaffTable({ members, currentUserId, timeZone }: StaffTableProps) {
  const columns = useMemo<ColumnDef<StaffMemberDto>[]>(
    () => [
      {
        id: "name",
        header: "Name",
        accessorFn: (m) => m.name,
        cell: ({ row }) => (
          <span className="flex items-center gap-2 font-medium whitespace-nowrap">
            {row.original.name}
            {row.original.userId === currentUserId ? <Badge tone="muted">You</Badge> : null}
          </span>
        ),
      },
      { id: "email", header: "E-mail", accessorFn: (m) => m.email },
      {
        id: "role",
        header: "Role",
        accessorFn: (m) => roleLabels[m.role],
        // Your own role is changed by another owner, so nobody locks themselves out by a slip.
        cell: ({ row }) =>
          row.original.userId === currentUserId ? roleLabels[row.original.role] : <MemberRoleSelect member={row.original} />,
      },
      {
        id: "status",
        header: "Status",
        accessorFn: (m) => (m.active ? "Active" : "Deactivated"),
        cell: ({ row }) =>
          row.original.active ? <Badge>Active</Badge> : <Badge tone="muted">Deactivated</Badge>,
      },
      {
        id: "joined",
        header: "Joined",
        accessorFn: (m) => m.joinedAt,
        cell: ({ row }) => <span className="whitespace-nowrap">{formatDate(row.original.joinedAt, timeZone)}</span>,
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) =>
          row.original.userId === currentUserId ? null : <MemberStatusAction member={row.original} />,
      },
    ],
    [currentUserId, timeZone],
  );

  return (
    <DataTable
      label="Team members"
      filterLabel="Filter team"
      data={members}
      columns={columns}
      getRowId={(m) => m.userId}
      initialSorting={[{ id: "name", desc: false }]}
      emptyMessage="Nobody on the team yet."
    />
  );
}
