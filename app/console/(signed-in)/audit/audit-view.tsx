"use client";
import { useState } from "react";
import type { AuditEntry } from "@/api-core/audit/audit-trail";
import { PageTitle, useConsole } from "../../console-shell";
import { utcTime } from "../../format";
import { DataTable, FilterBar, FilterInput, OlderButton, usePagedList, type Column } from "../../table";

const columns: Column<AuditEntry>[] = [
  { header: "Time", cell: (entry) => utcTime(entry.at), className: "whitespace-nowrap" },
  { header: "Who", cell: (entry) => entry.actorEmail ?? entry.actorId ?? "admin CLI" },
  { header: "Action", cell: (entry) => <code className="font-mono text-xs">{entry.action}</code> },
  { header: "Target", cell: (entry) => `${entry.targetType} ${entry.targetId ?? ""}` },
  { header: "Detail", cell: (entry) => <code className="break-all font-mono text-xs text-ink-500">{entry.detail === null ? "" : JSON.stringify(entry.detail)}</code> },
];

export function AuditView() {
  const { teamId } = useConsole();
  const [filter, setFilter] = useState<Record<string, string>>({});
  const trail = usePagedList<AuditEntry>("audit-trail", { teamId, action: filter.action });
  return (
    <>
      <PageTitle title="Audit trail">What people and the admin CLI changed, newest first. Entries are never edited or deleted.</PageTitle>
      <FilterBar onApply={setFilter}>
        <FilterInput label="Action" name="action" placeholder="key.issued" />
      </FilterBar>
      <DataTable label="Audit trail" columns={columns} rows={trail.entries} rowKey={(entry) => entry.id} error={trail.error} empty="Nothing recorded yet." />
      <OlderButton list={trail} />
    </>
  );
}
