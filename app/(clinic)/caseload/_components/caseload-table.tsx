"use client";
import Link from "next/link";
import { useMemo, useState } from "react";
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { SelectField } from "@/components/ui/choice-fields";
import { TextField } from "@/components/ui/text-field";
import type { CaseloadRow } from "@/db/queries/clients";
import { programmeStatus, reviewStatus, screeningWords, STATUS_FILTERS, type StatusFilter } from "./caseload-status";

const shortDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "Europe/London" });
const date = (value: string | null) => (value ? shortDate.format(new Date(value)) : "—");

const columns: ColumnDef<CaseloadRow>[] = [
  {
    id: "client",
    header: "Client",
    accessorFn: (row) => row.fullName,
    cell: ({ row }) => (
      <>
        <Link href={`/clients/${row.original.id}`} className="font-bold">
          {row.original.fullName}
        </Link>
        <span className="block text-sm text-ink-soft">
          {row.original.email} · {row.original.hasAccount ? "Account active" : "Invitation sent"}
        </span>
      </>
    ),
  },
  { id: "screening", header: "Screening", accessorFn: (row) => screeningWords(row.screeningOutcome) },
  { id: "programme", header: "Programme", accessorFn: (row) => programmeStatus(row).label, sortingFn: (a, b) => programmeStatus(a.original).rank - programmeStatus(b.original).rank },
  { id: "published", header: "Version in force since", accessorFn: (row) => row.publishedAt ?? "", cell: ({ row }) => date(row.original.publishedAt) },
  {
    id: "review",
    header: "Review date",
    accessorFn: (row) => row.reviewOn ?? "9999",
    cell: ({ row }) => {
      const status = reviewStatus(row.original.reviewOn);
      return (
        <span className={status === "overdue" ? "font-bold text-blocks" : ""}>
          {status === "overdue" ? <span aria-hidden>▲ </span> : null}
          {date(row.original.reviewOn)}
          {status === "overdue" ? " (overdue)" : status === "soon" ? " (this week)" : ""}
        </span>
      );
    },
  },
  // Check-ins arrive with the client's session log; until then the column says so rather than hiding.
  { id: "last-check-in", header: "Last check-in", accessorFn: () => "", enableSorting: false, cell: () => <span className="text-ink-soft">None yet</span> },
];

export function CaseloadTable({ rows }: { rows: CaseloadRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "client", desc: false }]);
  const [search, setSearch] = useState("");
  const [status, setStatus] = useState<StatusFilter>("all");
  const filtered = useMemo(() => rows.filter((row) => STATUS_FILTERS[status].test(row)), [rows, status]);
  // TanStack Table hands back new functions on every render, so the React Compiler leaves this component alone.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: filtered,
    columns,
    state: { sorting, globalFilter: search },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    globalFilterFn: (row, _column, value: string) => `${row.original.fullName} ${row.original.email}`.toLowerCase().includes(value.toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const shown = table.getRowModel().rows;
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Search by name or e-mail" type="search" value={search} onChange={(event) => setSearch(event.target.value)} />
        <SelectField
          label="Show"
          options={Object.entries(STATUS_FILTERS).map(([value, filter]) => ({ value, label: filter.label }))}
          value={status}
          onChange={(event) => setStatus(event.target.value as StatusFilter)}
        />
      </div>
      <p role="status" aria-live="polite" className="text-sm text-ink-soft">
        Showing {shown.length} of {rows.length} clients.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[44rem] text-left">
          <caption className="sr-only">Your clients; select a column heading to sort</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-line">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined} className="py-2 pr-3">
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-center gap-1 font-bold">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {shown.map((row) => (
              <tr key={row.id} className="border-b border-line-soft align-top">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="py-2 pr-3">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {shown.length === 0 ? <p className="text-ink-soft">No clients match. Clear the search or choose “All clients”.</p> : null}
    </div>
  );
}
