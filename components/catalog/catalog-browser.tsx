"use client";

import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import { catalogKinds, type CatalogKind } from "@/lib/catalog/schema";
import { kindHeading } from "@/lib/catalog/kinds";
import { Card } from "@/components/ui/card";
import { cellValue, columnsFor, tableQuery, visibleRows, type CatalogRow, type Column, type TableState } from "./catalog-table-model";
import { OriginBadge } from "./origin-badge";
import { useFormat } from "@/components/format/format-provider";

function Cell({ row, column }: { row: CatalogRow; column: Column }) {
  const fmt = useFormat();
  const v = cellValue(row, column.key);
  if (v === null) return <span className="text-slate-400">—</span>;
  if (column.key === "listPrice" && typeof v === "number") return <>{fmt.money(v)}</>;
  return (
    <>
      {v}
      {column.unit ? ` ${column.unit}` : ""}
    </>
  );
}

function SortHeader({ column, state, onSort }: { column: { key: string; label: string; unit: string }; state: TableState; onSort: (key: string) => void }) {
  const active = state.sort === column.key;
  return (
    <th scope="col" aria-sort={active ? (state.dir === "asc" ? "ascending" : "descending") : "none"} className="px-2 py-2 font-medium whitespace-nowrap">
      <button type="button" onClick={() => onSort(column.key)} className={`inline-flex items-center gap-1 hover:text-signal ${active ? "text-ink" : ""}`}>
        {column.label}
        <span aria-hidden className="w-3 text-xs">
          {active ? (state.dir === "asc" ? "▲" : "▼") : ""}
        </span>
      </button>
    </th>
  );
}

function KindTable({ kind, rows, state, onSort }: { kind: CatalogKind; rows: CatalogRow[]; state: TableState; onSort: (key: string) => void }) {
  const columns = columnsFor(kind, rows);
  const shown = visibleRows(rows, kind, state);
  if (!shown.length) return null;
  return (
    <section aria-labelledby={`heading-${kind}`} className="mb-6">
      <h2 id={`heading-${kind}`} className="mb-2 text-lg font-semibold">
        {kindHeading[kind]} <span className="text-sm font-normal text-slate-500">({shown.length})</span>
      </h2>
      <Card className="relative overflow-x-auto p-0">
        <table className="w-full text-sm" data-testid={`catalog-table-${kind}`}>
          <thead className="bg-slate-50 text-left text-slate-500">
            <tr>
              <SortHeader column={{ key: "name", label: "Name", unit: "" }} state={state} onSort={onSort} />
              {columns.map((c) => (
                <SortHeader key={c.key} column={c} state={state} onSort={onSort} />
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr key={r.id} className="border-t border-line align-top" data-testid="catalog-row" data-entry-id={r.id}>
                <td className="min-w-56 px-2 py-2">
                  <Link href={`/catalog/${r.id}`} className="font-medium text-signal underline underline-offset-2">
                    {r.name}
                  </Link>
                  <div className="font-mono text-xs text-slate-500">{r.id}</div>
                  <div className="mt-1 flex flex-wrap gap-1">
                    {r.origin !== "shipped" ? <OriginBadge origin={r.origin} /> : null}
                    {r.lifeSafety ? <span className="rounded bg-warn-soft px-1.5 py-0.5 text-xs text-warn">Life safety</span> : null}
                  </div>
                </td>
                {columns.map((c) => (
                  <td key={c.key} className="px-2 py-2 whitespace-nowrap tabular-nums">
                    <Cell row={r} column={c} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </Card>
    </section>
  );
}

/** The effective catalog as one table per kind: filter by kind, source and free text; sort by any column. */
export function CatalogBrowser({ rows, initial }: { rows: CatalogRow[]; initial: TableState }) {
  const [state, setState] = useState<TableState>(initial);
  // keep the view in the address so it can be shared and survives a reload (no navigation)
  useEffect(() => {
    window.history.replaceState(null, "", `${window.location.pathname}${tableQuery(state)}`);
  }, [state]);

  const counts = useMemo(() => Object.fromEntries(catalogKinds.map((k) => [k, rows.filter((r) => r.kind === k).length])) as Record<CatalogKind, number>, [rows]);
  const kinds: readonly CatalogKind[] = state.kind === "all" ? catalogKinds : [state.kind];
  const total = kinds.reduce((n, k) => n + visibleRows(rows, k, state).length, 0);
  const uploaded = rows.filter((r) => r.origin !== "shipped").length;
  const onSort = (key: string) => setState((s) => ({ ...s, sort: key, dir: s.sort === key && s.dir === "asc" ? "desc" : "asc" }));

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-end gap-3" role="search">
        <label className="text-sm">
          <span className="font-medium">Kind</span>
          <select className="mt-1 block rounded-md border border-line bg-white px-3 py-2" value={state.kind} onChange={(e) => setState((s) => ({ ...s, kind: e.target.value as TableState["kind"] }))}>
            <option value="all">All kinds ({rows.length})</option>
            {catalogKinds.map((k) => (
              <option key={k} value={k}>
                {kindHeading[k]} ({counts[k]})
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          <span className="font-medium">Search</span>
          <input
            type="search"
            className="mt-1 block w-72 rounded-md border border-line bg-white px-3 py-2"
            placeholder="name, id, figure…"
            value={state.q}
            onChange={(e) => setState((s) => ({ ...s, q: e.target.value }))}
          />
        </label>
        <label className="text-sm">
          <span className="font-medium">Source</span>
          <select className="mt-1 block rounded-md border border-line bg-white px-3 py-2" value={state.source} onChange={(e) => setState((s) => ({ ...s, source: e.target.value as TableState["source"] }))}>
            <option value="all">Shipped and your upload</option>
            <option value="upload">Only your upload ({uploaded})</option>
          </select>
        </label>
        <p className="pb-2 text-sm text-slate-600" role="status" aria-live="polite">
          {total} {total === 1 ? "entry" : "entries"} shown
        </p>
      </div>
      {kinds.map((k) => (
        <KindTable key={k} kind={k} rows={rows} state={state} onSort={onSort} />
      ))}
      {total === 0 ? <p className="text-sm text-slate-600">No entry matches. Clear the search or pick another kind.</p> : null}
    </div>
  );
}
