"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { KeyUsage, UsageSummary } from "@/api-core/quota/usage-summary";
import { adminGet } from "../../admin-api";
import { PageTitle, useConsole, useTeamName } from "../../console-shell";
import { count, thisMonth } from "../../format";
import { DataTable, type Column } from "../../table";
import tailwind from "@/tailwind.config";

/** Every UTC day of the month, with zero where nothing was evaluated, so the chart's axis is the whole month. */
function wholeMonth(month: string, days: UsageSummary["days"]) {
  const [year, monthNumber] = month.split("-").map(Number);
  const length = new Date(Date.UTC(year, monthNumber, 0)).getUTCDate();
  return Array.from({ length }, (_, index) => {
    const day = `${month}-${String(index + 1).padStart(2, "0")}`;
    const found = days.find((entry) => entry.day === day);
    return { day: String(index + 1), evaluations: found?.evaluations ?? 0, requests: found?.requests ?? 0 };
  });
}

// The chart draws in SVG attributes, so it takes the palette's values rather than class names.
const colors = tailwind.theme.extend.colors;

export function UsageView() {
  const { teamId, mustPickTeam } = useConsole();
  const teamName = useTeamName();
  const [month, setMonth] = useState(thisMonth());
  const usage = useQuery({ queryKey: ["usage", teamId, month], queryFn: () => adminGet<UsageSummary>("usage", { teamId, month }) });
  const total = usage.data?.keys.reduce((sum, key) => sum + key.units, 0);

  const columns: Column<KeyUsage>[] = [
    { header: "Key", cell: (key) => <span className="font-medium text-ink-900">{key.name}</span> },
    { header: "Prefix", cell: (key) => <code className="font-mono">{key.prefix}…</code> },
    ...(mustPickTeam ? [{ header: "Team", cell: (key: KeyUsage) => teamName(key.teamId) }] : []),
    { header: "Units", cell: (key) => count(key.units), className: "tabular-nums" },
    { header: "Monthly limit", cell: (key) => count(key.monthlyUnits), className: "tabular-nums" },
    { header: "Used", cell: (key) => <UsedBar units={key.units} limit={key.monthlyUnits} /> },
  ];

  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <PageTitle title="Usage">Evaluation units (one per redshift evaluated) per UTC day and per key.</PageTitle>
        <label className="text-sm font-medium text-ink-700">
          Month
          <input type="month" value={month} max={thisMonth()} onChange={(event) => event.target.value && setMonth(event.target.value)} className="ml-2 rounded-md border border-ink-100 bg-white px-2 py-1.5 text-ink-900" />
        </label>
      </div>
      <section aria-label="Evaluations per day" className="mt-6 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
        <h2 className="text-sm font-medium text-ink-700">
          Evaluations per day, {month} {total !== undefined && <span className="font-normal text-ink-500">· {count(total)} {total === 1 ? "unit" : "units"} in all</span>}
        </h2>
        <div className="mt-3 h-64">
          {usage.data && (
            <ResponsiveContainer width="100%" height="100%">
              <BarChart data={wholeMonth(month, usage.data.days)} margin={{ top: 4, right: 8, bottom: 0, left: 8 }}>
                <CartesianGrid stroke={colors.ink[100]} vertical={false} />
                <XAxis dataKey="day" tick={{ fill: colors.ink[500], fontSize: 12 }} tickLine={false} axisLine={{ stroke: colors.ink[100] }} interval="preserveStartEnd" />
                <YAxis tick={{ fill: colors.ink[500], fontSize: 12 }} tickLine={false} axisLine={false} allowDecimals={false} width={56} />
                <Tooltip cursor={{ fill: colors.ink[50] }} formatter={(value) => [count(Number(value)), "evaluations"]} labelFormatter={(day) => `${month}-${String(day).padStart(2, "0")}`} />
                <Bar isAnimationActive={false} dataKey="evaluations" fill={colors.shift[500]} radius={[3, 3, 0, 0]} />
              </BarChart>
            </ResponsiveContainer>
          )}
        </div>
      </section>
      <h2 className="mt-8 text-lg font-medium text-ink-900">Per key</h2>
      <DataTable label="Usage per key" columns={columns} rows={usage.data?.keys} rowKey={(key) => key.keyId} error={usage.error} empty="No keys, so no usage." />
    </>
  );
}

function UsedBar({ units, limit }: { units: number; limit: number }) {
  const share = Math.min(1, units / limit);
  return (
    <span className="flex items-center gap-2">
      <span className="h-1.5 w-24 overflow-hidden rounded bg-ink-100">
        <span className="block h-full bg-shift-500" style={{ width: `${share * 100}%` }} />
      </span>
      <span className="tabular-nums text-xs text-ink-500">{(share * 100).toFixed(share < 0.01 && share > 0 ? 2 : 0)}%</span>
    </span>
  );
}
