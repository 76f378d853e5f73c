"use client";
// The studio's golfers: search, sort and pages are done by the server (GET /api/golfers), so the
// table stays quick with thousands of golfers.
import Link from "next/link";
import { useEffect, useState } from "react";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { apiFetch } from "@/lib/client/api";

type Row = { id: string; name: string; email: string | null; handedness: "right" | "left"; isMinor: boolean; updatedAt: string; lastFittingAt: string | null; videoConsentAt: string | null };
type Page = { golfers: Row[]; total: number };

const PAGE_SIZE = 25;
const sortKeys: Record<string, string> = { name: "name", updatedAt: "updated", lastFittingAt: "lastFitting" };
const date = (iso: string | null) => (iso ? new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" }) : "—");

const column = createColumnHelper<Row>();
const columns = [
  column.accessor("name", { header: "Name", cell: (c) => <Link className="underline-offset-2 hover:underline" href={`/studio/golfers/${c.row.original.id}`}>{c.getValue()}</Link> }),
  column.accessor("email", { header: "E-mail", enableSorting: false, cell: (c) => c.getValue() ?? "—" }),
  column.accessor("handedness", { header: "Hand", enableSorting: false, cell: (c) => (c.getValue() === "left" ? "left" : "right") }),
  column.accessor("videoConsentAt", { header: "Video consent", enableSorting: false, cell: (c) => (c.getValue() ? "recorded" : "not yet") }),
  column.accessor("lastFittingAt", { header: "Last fitting", cell: (c) => <span className="num">{date(c.getValue())}</span> }),
  column.accessor("updatedAt", { header: "Updated", cell: (c) => <span className="num">{date(c.getValue())}</span> }),
];

export function GolferTable() {
  const [search, setSearch] = useState("");
  const [q, setQ] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [pageIndex, setPageIndex] = useState(0);

  useEffect(() => {
    const t = setTimeout(() => { setQ(search.trim()); setPageIndex(0); }, 250);
    return () => clearTimeout(t);
  }, [search]);

  const sort = sorting[0] ?? { id: "name", desc: false };
  const params = new URLSearchParams({ sort: sortKeys[sort.id] ?? "name", dir: sort.desc ? "desc" : "asc", limit: String(PAGE_SIZE), offset: String(pageIndex * PAGE_SIZE) });
  if (q) params.set("q", q);
  const { data, isFetching, error } = useQuery({
    queryKey: ["golfers", params.toString()],
    queryFn: ({ signal }) => apiFetch<Page>(`/api/golfers?${params}`, { signal }),
    placeholderData: keepPreviousData,
  });
  const total = data?.total ?? 0;
  const pageCount = Math.max(1, Math.ceil(total / PAGE_SIZE));

  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table is the project's table; nothing here is memoized by hand
  const table = useReactTable({
    data: data?.golfers ?? [],
    columns,
    state: { sorting },
    onSortingChange: (u) => { setSorting(u); setPageIndex(0); },
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    pageCount,
    getCoreRowModel: getCoreRowModel(),
  });

  return (
    <div className="flex flex-col gap-3">
      <label className="max-w-sm">
        <span className="field-label">Search by name or e-mail</span>
        <input className="field" type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="Start of a name…" />
      </label>
      {error && <p role="alert" className="field-error">{error.message}</p>}
      <div className="card overflow-x-auto p-0">
        <table className="w-full text-left" aria-busy={isFetching}>
          <thead className="border-b border-chalk-300 text-label uppercase text-slate-600">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} className="px-4 py-2 font-medium" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="inline-flex items-center gap-1 uppercase" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-chalk-200">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-4 py-2">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
            {data && data.golfers.length === 0 && (
              <tr><td colSpan={columns.length} className="px-4 py-6 text-slate-600">No golfers match.</td></tr>
            )}
          </tbody>
        </table>
      </div>
      <nav className="flex items-center gap-3" aria-label="Pages">
        <button type="button" className="btn-quiet" disabled={pageIndex === 0} onClick={() => setPageIndex((p) => p - 1)}>Previous</button>
        <span className="num text-label text-slate-600">Page {pageIndex + 1} of {pageCount} · {total} golfers</span>
        <button type="button" className="btn-quiet" disabled={pageIndex + 1 >= pageCount} onClick={() => setPageIndex((p) => p + 1)}>Next</button>
      </nav>
    </div>
  );
}
