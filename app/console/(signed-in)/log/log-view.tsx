"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import type { KeyView } from "@/api-core/access/types";
import type { RequestLogEntry } from "@/api-core/audit/request-log";
import { adminGet, adminUrl, type Query } from "../../admin-api";
import { PageTitle, useConsole } from "../../console-shell";
import { count, utcTime } from "../../format";
import { DataTable, FilterBar, FilterInput, OlderButton, usePagedList, type Column } from "../../table";

const ROUTES = ["distances", "lookback-time", "angular-size", "volumes", "expansion", "redshifts", "cosmologies", "catalogs"].map((name) => `/api/v1/${name}`);

/** A datetime-local value read as UTC, as every time in the console is. */
const utcMillis = (value: string | undefined) => (value ? Date.parse(`${value}:00Z`) : undefined);

const columns: Column<RequestLogEntry>[] = [
  { header: "Time", cell: (entry) => utcTime(entry.at), className: "whitespace-nowrap" },
  { header: "Key", cell: (entry) => <code className="font-mono">{entry.keyPrefix ? `${entry.keyPrefix}…` : "—"}</code> },
  { header: "Call", cell: (entry) => <span className="whitespace-nowrap"><span className="text-ink-500">{entry.method}</span> {entry.route}</span> },
  { header: "Status", cell: (entry) => <span className={entry.status >= 400 ? "font-medium text-shift-700" : "text-ink-900"}>{entry.status}</span>, className: "tabular-nums" },
  { header: "Duration", cell: (entry) => `${entry.durationMs} ms`, className: "whitespace-nowrap tabular-nums" },
  { header: "Units", cell: (entry) => count(entry.evaluations), className: "tabular-nums" },
  {
    header: "Cosmology",
    cell: (entry) => (entry.cosmologyHash ? <span title={entry.cosmologyHash}>{entry.cosmologyRef ?? "inline"} <code className="font-mono text-xs text-ink-500">{entry.cosmologyHash.slice(0, 19)}…</code></span> : "—"),
    className: "whitespace-nowrap",
  },
  { header: "Client", cell: (entry) => entry.clientAddress ?? "—" },
];

export function LogView() {
  const { teamId } = useConsole();
  const [filter, setFilter] = useState<Record<string, string>>({});
  const query: Query = { teamId, keyId: filter.keyId, route: filter.route, status: filter.status, from: utcMillis(filter.from), to: utcMillis(filter.to) };
  const log = usePagedList<RequestLogEntry>("request-log", query);
  const keys = useQuery({ queryKey: ["keys", teamId], queryFn: async () => (await adminGet<{ keys: KeyView[] }>("keys", { teamId })).keys });
  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <PageTitle title="Request log">Every call made with a key of the team, newest first; each names the cosmology that answered it.</PageTitle>
        <a href={adminUrl("request-log", { ...query, format: "csv" })} download className="rounded-md border border-ink-100 bg-white px-3 py-1.5 text-sm text-ink-700 hover:border-shift-400">
          Export CSV
        </a>
      </div>
      <FilterBar onApply={setFilter}>
        <label className="block text-xs font-medium text-ink-500">
          Key
          <select name="keyId" className="mt-1 block rounded-md border border-ink-100 bg-white px-2 py-1.5 text-sm text-ink-900">
            <option value="">Any key</option>
            {keys.data?.map((key) => (
              <option key={key.id} value={key.id}>{key.name} ({key.prefix}…)</option>
            ))}
          </select>
        </label>
        <FilterInput label="Route" name="route" list="log-routes" placeholder="/api/v1/distances" />
        <datalist id="log-routes">
          {ROUTES.map((route) => (
            <option key={route} value={route} />
          ))}
        </datalist>
        <FilterInput label="Status" name="status" type="number" min={100} max={599} className="mt-1 block w-20 rounded-md border border-ink-100 px-2 py-1.5 text-sm text-ink-900" />
        <FilterInput label="From (UTC)" name="from" type="datetime-local" />
        <FilterInput label="Until (UTC)" name="to" type="datetime-local" />
      </FilterBar>
      <DataTable label="Request log" columns={columns} rows={log.entries} rowKey={(entry) => entry.id} error={log.error} empty="No calls match. Calls made with the team's keys appear here within a second." />
      <OlderButton list={log} />
    </>
  );
}
