"use client";
import { useInfiniteQuery } from "@tanstack/react-query";
import { adminGet, type Query } from "./admin-api";

export interface Column<Row> {
  header: string;
  cell: (row: Row) => React.ReactNode;
  className?: string;
}

/** The console's one table: loading, failure and empty states included; scrolls sideways when narrow. */
export function DataTable<Row>({ label, columns, rows, rowKey, error, empty }: {
  label: string;
  columns: Column<Row>[];
  rows: Row[] | undefined;
  rowKey: (row: Row) => string | number;
  error?: Error | null;
  empty: string;
}) {
  if (error) return <p role="alert" className="mt-3 rounded-md bg-shift-400/10 px-3 py-2 text-sm text-shift-700">{error.message}</p>;
  if (!rows) return <p className="mt-3 text-sm text-ink-500">Loading…</p>;
  if (rows.length === 0) return <p className="mt-3 rounded-md border border-dashed border-ink-100 bg-white px-4 py-6 text-center text-sm text-ink-500">{empty}</p>;
  return (
    <div className="mt-3 overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table aria-label={label} className="w-full text-left text-sm">
        <thead className="bg-ink-50 text-xs font-medium uppercase tracking-wide text-ink-500">
          <tr>
            {columns.map((column) => (
              <th key={column.header} scope="col" className="whitespace-nowrap px-3 py-2">{column.header}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-t border-ink-100 align-top">
              {columns.map((column) => (
                <td key={column.header} className={`px-3 py-2 text-ink-700 ${column.className ?? ""}`}>{column.cell(row)}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

interface Page<Entry> {
  entries: Entry[];
  nextBefore: number | null;
}

/** A newest-first admin list read page by page with its `before` cursor. */
export function usePagedList<Entry>(path: string, query: Query) {
  const list = useInfiniteQuery({
    queryKey: [path, query],
    queryFn: ({ pageParam }) => adminGet<Page<Entry>>(path, { ...query, before: pageParam, limit: 50 }),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });
  return { ...list, entries: list.data?.pages.flatMap((page) => page.entries) };
}

export function OlderButton({ list }: { list: { entries?: unknown[]; hasNextPage: boolean; isFetchingNextPage: boolean; fetchNextPage: () => unknown } }) {
  if (!list.hasNextPage) return list.entries?.length ? <p className="mt-3 text-sm text-ink-500">No older entries.</p> : null;
  return (
    <button type="button" onClick={() => list.fetchNextPage()} disabled={list.isFetchingNextPage} className="mt-3 rounded-md border border-ink-100 bg-white px-3 py-1.5 text-sm text-ink-700 hover:border-shift-400 disabled:opacity-60">
      {list.isFetchingNextPage ? "Loading…" : "Older"}
    </button>
  );
}

/** A row of filter inputs; on submit hands back every filled-in value by input name. */
export function FilterBar({ onApply, children }: { onApply: (values: Record<string, string>) => void; children: React.ReactNode }) {
  return (
    <form
      role="search"
      className="mt-4 flex flex-wrap items-end gap-3 rounded-lg border border-ink-100 bg-white p-3 shadow-sm"
      onSubmit={(event) => {
        event.preventDefault();
        const values = Object.fromEntries([...new FormData(event.currentTarget)].filter(([, value]) => value !== "").map(([name, value]) => [name, String(value)]));
        onApply(values);
      }}
    >
      {children}
      <span className="flex gap-1">
        <button type="submit" className="rounded-md bg-ink-900 px-3 py-1.5 text-sm font-medium text-white hover:bg-ink-700">Apply</button>
        <button type="reset" onClick={() => onApply({})} className="rounded-md px-3 py-1.5 text-sm text-ink-500 hover:text-ink-900">Clear</button>
      </span>
    </form>
  );
}

export function FilterInput({ label, ...input }: { label: string } & React.InputHTMLAttributes<HTMLInputElement>) {
  return (
    <label className="block text-xs font-medium text-ink-500">
      {label}
      <input className="mt-1 block rounded-md border border-ink-100 px-2 py-1.5 text-sm text-ink-900 focus:border-shift-400 focus:outline-none" {...input} />
    </label>
  );
}
