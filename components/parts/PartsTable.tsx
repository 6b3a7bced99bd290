"use client";

import { useMemo, useState } from "react";
import {
  flexRender,
  getCoreRowModel,
  getExpandedRowModel,
  getFilteredRowModel,
  getGroupedRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type GroupingState,
  type SortingState,
} from "@tanstack/react-table";
import type { Part } from "@/lib/engine/fixtures/types";
import { LabelChip } from "./build/LabelChip";
import { useLabels } from "./build/label-context";
import type { Formatters } from "./format";

export interface PartRow extends Part {
  /** The label pencilled on the piece (the build result's). */
  label: string;
  fixtureLabel: string;
  materialName: string;
}

type GroupBy = "none" | "materialName" | "fixtureLabel";

/** The parts list: sort by any column, group by material or fixture, filter by text. */
export function PartsTable({ rows, fmt }: { rows: PartRow[]; fmt: Formatters }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [groupBy, setGroupBy] = useState<GroupBy>("materialName");
  const [filter, setFilter] = useState("");
  const [expanded, setExpanded] = useState<ExpandedState>(true);
  const { selected } = useLabels();
  // A stable array: a new one each render would make the table regroup and reset expansion in a loop.
  const grouping = useMemo<GroupingState>(() => (groupBy === "none" ? [] : [groupBy]), [groupBy]);

  const columns = useMemo<ColumnDef<PartRow>[]>(
    () => [
      { accessorKey: "label", header: "Label", cell: (c) => (c.getValue<string>() ? <LabelChip label={c.getValue<string>()} /> : null), aggregatedCell: () => null, enableGrouping: false },
      { accessorKey: "fixtureLabel", header: "Fixture" },
      { accessorKey: "name", header: "Part" },
      { accessorKey: "qty", header: "Qty", aggregationFn: "sum", aggregatedCell: (c) => <b>{c.getValue<number>()}</b> },
      { accessorKey: "lengthMm", header: "Length", cell: (c) => fmt.len(c.getValue<number>()), aggregatedCell: () => null },
      { accessorKey: "widthMm", header: "Width", cell: (c) => fmt.len(c.getValue<number>()), aggregatedCell: () => null },
      { accessorKey: "thicknessMm", header: "Thickness", cell: (c) => fmt.len(c.getValue<number>()), aggregatedCell: () => null },
      { accessorKey: "materialName", header: "Material" },
      { accessorKey: "grain", header: "Grain", cell: (c) => (c.getValue<string>() === "none" ? "any" : `along ${c.getValue<string>()}`) },
      { id: "edges", accessorFn: (r) => r.edges.join(", "), header: "Edges", enableGrouping: false },
      { id: "joinery", accessorFn: (r) => r.joinery.join("; "), header: "Joinery", enableGrouping: false },
    ],
    [fmt],
  );

  // TanStack Table keeps its own state; the compiler skipping this component is expected.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, grouping, globalFilter: filter, expanded },
    onSortingChange: setSorting,
    onExpandedChange: setExpanded,
    onGlobalFilterChange: setFilter,
    globalFilterFn: "includesString",
    autoResetExpanded: false,
    autoResetPageIndex: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getGroupedRowModel: getGroupedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
  });

  return (
    <div className="flex flex-col gap-3">
      <div className="no-print flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col gap-1">
          <span className="text-walnut-700">Group by</span>
          <select value={groupBy} onChange={(e) => setGroupBy(e.target.value as GroupBy)} className="rounded border border-walnut-300 bg-white px-2 py-1">
            <option value="none">Nothing</option>
            <option value="materialName">Material</option>
            <option value="fixtureLabel">Fixture</option>
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="text-walnut-700">Filter</span>
          <input type="search" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Part, fixture, material..." className="rounded border border-walnut-300 bg-white px-2 py-1" />
        </label>
        <span className="text-walnut-500" data-testid="parts-count">
          {table.getFilteredRowModel().flatRows.filter((r) => !r.getIsGrouped()).reduce((s, r) => s + r.original.qty, 0)} pieces
        </span>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" data-testid="parts-table">
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="border-b border-walnut-300 text-left">
                {hg.headers.map((h) => {
                  const dir = h.column.getIsSorted();
                  return (
                    <th key={h.id} className="px-2 py-1 font-semibold" aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}>
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="hover:underline">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        {dir === "asc" ? " ▲" : dir === "desc" ? " ▼" : ""}
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={row.getIsGrouped() ? "bg-paper-deep font-semibold" : `border-b border-walnut-100 break-inside-avoid ${selected !== null && row.original.label === selected ? "bg-steel-100" : ""}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-2 py-1 align-top">
                    {cell.getIsGrouped() ? (
                      <button type="button" onClick={row.getToggleExpandedHandler()} aria-expanded={row.getIsExpanded()}>
                        {row.getIsExpanded() ? "▾ " : "▸ "}
                        {flexRender(cell.column.columnDef.cell, cell.getContext())} ({row.subRows.length})
                      </button>
                    ) : cell.getIsAggregated() ? (
                      flexRender(cell.column.columnDef.aggregatedCell ?? cell.column.columnDef.cell, cell.getContext())
                    ) : cell.getIsPlaceholder() ? null : (
                      flexRender(cell.column.columnDef.cell, cell.getContext())
                    )}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
