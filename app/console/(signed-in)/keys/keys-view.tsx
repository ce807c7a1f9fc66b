"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { DEFAULT_MONTHLY_UNITS, DEFAULT_PER_MINUTE, KEY_SCOPES, type IssuedKey, type KeyView, type Member } from "@/api-core/access/types";
import type { UsageSummary } from "@/api-core/quota/usage-summary";
import { adminGet, adminSend, formStateOf } from "../../admin-api";
import { can, PageTitle, useConsole, useTeamName } from "../../console-shell";
import { Field, FormMessage } from "../../form-parts";
import { count, thisMonth, utcTime } from "../../format";
import { DataTable, type Column } from "../../table";
import { SecretOnce } from "./secret-once";

const STATUS_STYLE: Record<KeyView["status"], string> = {
  active: "bg-emerald-50 text-emerald-800",
  revoked: "bg-shift-400/15 text-shift-700",
  expired: "bg-ink-100 text-ink-700",
};

export function KeysView({ initialKeys }: { initialKeys: KeyView[] }) {
  const { user, teamId, mustPickTeam } = useConsole();
  const teamName = useTeamName();
  const [secret, setSecret] = useState<{ title: string; secret: string } | null>(null);
  const keys = useQuery({
    queryKey: ["keys", teamId],
    queryFn: async () => (await adminGet<{ keys: KeyView[] }>("keys", { teamId })).keys,
    // The server rendered the unfiltered list; a picked team needs its own read.
    initialData: teamId === undefined ? initialKeys : undefined,
  });
  const usage = useQuery({ queryKey: ["usage", teamId, thisMonth()], queryFn: () => adminGet<UsageSummary>("usage", { teamId }) });
  const members = useQuery({
    queryKey: ["members", teamId],
    queryFn: async () => (await adminGet<{ members: Member[] }>("members", { teamId })).members,
    enabled: can(user, "members:read"),
  });
  const unitsOf = (keyId: string) => usage.data?.keys.find((key) => key.keyId === keyId)?.units;
  const ownerOf = (key: KeyView) => {
    if (key.userId === null) return "team";
    if (key.userId === user.id) return "you";
    return members.data?.find((member) => member.id === key.userId)?.name ?? key.userId;
  };
  const canManage = can(user, "keys:manage");

  const columns: Column<KeyView>[] = [
    { header: "Name", cell: (key) => <span className="font-medium text-ink-900">{key.name}</span> },
    { header: "Key", cell: (key) => <code className="font-mono">{key.prefix}…</code>, className: "whitespace-nowrap" },
    ...(mustPickTeam ? [{ header: "Team", cell: (key: KeyView) => teamName(key.teamId) }] : []),
    { header: "Owner", cell: ownerOf },
    { header: "Scopes", cell: (key) => key.scopes.join(", ") },
    { header: "Units this month", cell: (key) => `${unitsOf(key.id) === undefined ? "…" : count(unitsOf(key.id)!)} / ${count(key.monthlyUnits)}`, className: "whitespace-nowrap tabular-nums" },
    { header: "Per minute", cell: (key) => count(key.perMinute), className: "tabular-nums" },
    { header: "Expires", cell: (key) => utcTime(key.expiresAt), className: "whitespace-nowrap" },
    {
      header: "Status",
      cell: (key) => (
        <>
          <span className={`rounded px-1.5 py-0.5 text-xs font-medium ${STATUS_STYLE[key.status]}`}>{key.status}</span>
          {key.replacedBy && key.status === "active" && <span className="mt-1 block text-xs text-ink-500">rotated: works until it expires</span>}
        </>
      ),
    },
    ...(canManage ? [{ header: "Actions", className: "whitespace-nowrap", cell: (key: KeyView) => (key.status === "active" && !key.replacedBy ? <KeyActions apiKey={key} onRotated={(rotated) => setSecret({ title: `New secret of ${rotated.key.name}`, secret: rotated.secret })} /> : null) }] : []),
  ];

  return (
    <>
      <PageTitle title="API keys">Keys send calls to the compute API as Authorization: Bearer &lt;key&gt;. Units count redshifts evaluated in this UTC month.</PageTitle>
      {secret && <SecretOnce {...secret} onDone={() => setSecret(null)} />}
      {canManage && <IssueKeyForm members={members.data} onIssued={(issued) => setSecret({ title: `Secret of ${issued.key.name}`, secret: issued.secret })} />}
      <DataTable label="API keys" columns={columns} rows={keys.data} rowKey={(key) => key.id} error={keys.error} empty="No keys yet. Issue one above to call the compute API." />
    </>
  );
}

function useKeyChange<Result>(change: () => Promise<Result>, onDone?: (result: Result) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: change,
    onSuccess: (result) => {
      queryClient.invalidateQueries({ queryKey: ["keys"] });
      queryClient.invalidateQueries({ queryKey: ["usage"] });
      onDone?.(result);
    },
  });
}

function IssueKeyForm({ members, onIssued }: { members: Member[] | undefined; onIssued: (issued: IssuedKey) => void }) {
  const { user, teamId, mustPickTeam } = useConsole();
  const [open, setOpen] = useState(false);
  const [form, setForm] = useState<HTMLFormElement | null>(null);
  const issue = useKeyChange(
    () => {
      const data = new FormData(form!);
      const number = (name: string) => (data.get(name) ? Number(data.get(name)) : undefined);
      const expiry = String(data.get("expiresAt") ?? "");
      return adminSend<IssuedKey>("POST", "keys", {
        name: data.get("name"),
        teamId,
        userId: data.get("userId") || null,
        scopes: data.getAll("scopes"),
        monthlyUnits: number("monthlyUnits"),
        perMinute: number("perMinute"),
        // The key works until the start of that day, UTC.
        expiresAt: expiry ? Date.parse(`${expiry}T00:00:00Z`) : null,
      });
    },
    (issued) => {
      form?.reset();
      setOpen(false);
      onIssued(issued);
    },
  );
  if (mustPickTeam) return <p className="mt-4 text-sm text-ink-500">Pick a team in the bar above to issue a key.</p>;
  if (!open) {
    return (
      <button type="button" onClick={() => setOpen(true)} className="mt-4 rounded-md bg-ink-900 px-3 py-2 text-sm font-medium text-white hover:bg-ink-700">
        Issue a key
      </button>
    );
  }
  const state = formStateOf(issue.error);
  return (
    <form ref={setForm} onSubmit={(event) => (event.preventDefault(), issue.mutate())} aria-label="Issue a key" className="mt-4 space-y-4 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <FormMessage state={state} />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Name" name="name" required placeholder="catalog pipeline" state={state} />
        <Field label="Monthly units" name="monthlyUnits" type="number" min={1} placeholder={String(DEFAULT_MONTHLY_UNITS)} state={state} />
        <Field label="Calls per minute" name="perMinute" type="number" min={1} placeholder={String(DEFAULT_PER_MINUTE)} state={state} />
        <Field label="Expires (optional, UTC date)" name="expiresAt" type="date" state={state} />
      </div>
      <div className="flex flex-wrap items-end gap-6">
        <fieldset>
          <legend className="text-sm font-medium text-ink-700">Scopes</legend>
          {KEY_SCOPES.map((scope) => (
            <label key={scope} className="mr-4 mt-1 inline-flex items-center gap-1.5 text-sm text-ink-700">
              <input type="checkbox" name="scopes" value={scope} defaultChecked={scope === "compute"} /> {scope}
            </label>
          ))}
        </fieldset>
        {user.role !== "member" && (
          <label className="block text-sm font-medium text-ink-700">
            Owner
            <select name="userId" className="mt-1 block rounded-md border border-ink-100 bg-white px-3 py-2 text-ink-900">
              <option value="">The team (no one person)</option>
              {members?.filter((member) => !member.pending).map((member) => (
                <option key={member.id} value={member.id}>{member.name}</option>
              ))}
            </select>
          </label>
        )}
      </div>
      <div className="flex gap-2">
        <button type="submit" disabled={issue.isPending} className="rounded-md bg-ink-900 px-4 py-2 text-sm font-medium text-white hover:bg-ink-700 disabled:opacity-60">Issue key</button>
        <button type="button" onClick={() => setOpen(false)} className="rounded-md px-4 py-2 text-sm text-ink-500 hover:text-ink-900">Cancel</button>
      </div>
    </form>
  );
}

const HOUR = 3600;

/** Revoke and rotate, each behind a second click that says what it will do. */
function KeyActions({ apiKey, onRotated }: { apiKey: KeyView; onRotated: (rotated: IssuedKey) => void }) {
  const [asking, setAsking] = useState<"revoke" | "rotate" | null>(null);
  const [overlapHours, setOverlapHours] = useState(24);
  const revoke = useKeyChange(() => adminSend("POST", `keys/${apiKey.id}/revoke`, {}));
  const rotate = useKeyChange(() => adminSend<IssuedKey>("POST", `keys/${apiKey.id}/rotate`, { overlapSeconds: overlapHours * HOUR }), onRotated);
  const error = revoke.error ?? rotate.error;
  const small = "rounded-md border px-2 py-1 text-xs";
  return (
    <span className="flex items-center gap-1.5 text-xs">
      {asking === "revoke" && (
        <>
          Stop {apiKey.prefix}… now?
          <button type="button" onClick={() => revoke.mutate()} disabled={revoke.isPending} className={`${small} border-shift-500 bg-shift-500 text-white`}>Revoke</button>
          <button type="button" onClick={() => setAsking(null)} className={`${small} border-ink-100`}>Keep</button>
        </>
      )}
      {asking === "rotate" && (
        <>
          <label>
            Old key works for <input type="number" min={0} max={720} value={overlapHours} onChange={(event) => setOverlapHours(Number(event.target.value))} className="w-14 rounded border border-ink-100 px-1 py-0.5" /> h
          </label>
          <button type="button" onClick={() => rotate.mutate()} disabled={rotate.isPending} className={`${small} border-ink-900 bg-ink-900 text-white`}>Rotate</button>
          <button type="button" onClick={() => setAsking(null)} className={`${small} border-ink-100`}>Cancel</button>
        </>
      )}
      {asking === null && (
        <>
          <button type="button" onClick={() => setAsking("rotate")} className={`${small} border-ink-100 hover:border-shift-400`}>Rotate…</button>
          <button type="button" onClick={() => setAsking("revoke")} className={`${small} border-ink-100 text-shift-700 hover:border-shift-400`}>Revoke…</button>
        </>
      )}
      {error && <span role="alert" className="text-shift-700">{error.message}</span>}
    </span>
  );
}
