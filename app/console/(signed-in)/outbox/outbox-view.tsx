"use client";
import { useQuery } from "@tanstack/react-query";
import type { OutboxMessage } from "@/api-core/mail/mailer";
import { adminGet } from "../../admin-api";
import { PageTitle } from "../../console-shell";
import { utcTime } from "../../format";
import { DataTable, type Column } from "../../table";

const columns: Column<OutboxMessage>[] = [
  { header: "Stored", cell: (message) => utcTime(message.at), className: "whitespace-nowrap" },
  { header: "To", cell: (message) => message.to },
  {
    header: "Message",
    cell: (message) => (
      <details>
        <summary className="cursor-pointer font-medium text-ink-900">{message.subject}</summary>
        <pre className="mt-2 whitespace-pre-wrap break-all font-sans text-ink-700">{message.text}</pre>
      </details>
    ),
  },
];

export function OutboxView() {
  const outbox = useQuery({ queryKey: ["outbox"], queryFn: async () => (await adminGet<{ messages: OutboxMessage[] }>("outbox")).messages });
  return (
    <>
      <PageTitle title="Outbox">Without an SMTP server (SMTP_URL unset), Comova keeps its mail here instead of sending it. Newest first.</PageTitle>
      <DataTable label="Outbox" columns={columns} rows={outbox.data} rowKey={(message) => message.id} error={outbox.error} empty="No mail stored. Invitations appear here when they are sent." />
    </>
  );
}
