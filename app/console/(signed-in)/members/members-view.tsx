"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ASSIGNABLE_ROLES } from "@/api-core/access/permissions";
import type { InvitationView, Member, Role } from "@/api-core/access/types";
import { adminGet, adminSend, formStateOf } from "../../admin-api";
import { can, PageTitle, useConsole, useTeamName } from "../../console-shell";
import { Field, FormMessage } from "../../form-parts";
import { utcTime } from "../../format";
import { DataTable, type Column } from "../../table";

export function MembersView() {
  const { user, teamId, mustPickTeam } = useConsole();
  const teamName = useTeamName();
  const members = useQuery({ queryKey: ["members", teamId], queryFn: async () => (await adminGet<{ members: Member[] }>("members", { teamId })).members });
  const canInvite = can(user, "members:invite");
  const invitations = useQuery({
    queryKey: ["invitations", teamId],
    queryFn: async () => (await adminGet<{ invitations: InvitationView[] }>("invitations", { teamId })).invitations,
    enabled: canInvite,
  });

  const columns: Column<Member>[] = [
    { header: "Name", cell: (member) => <span className="font-medium text-ink-900">{member.name}</span> },
    { header: "E-mail", cell: (member) => member.email },
    ...(mustPickTeam ? [{ header: "Team", cell: (member: Member) => teamName(member.teamId) }] : []),
    { header: "Role", cell: (member) => <RoleCell member={member} /> },
    { header: "Status", cell: (member) => (member.pending ? "invited, not joined yet" : "joined") },
    { header: "Since", cell: (member) => utcTime(member.createdAt), className: "whitespace-nowrap" },
  ];
  const invitationColumns: Column<InvitationView>[] = [
    { header: "E-mail", cell: (invitation) => invitation.email },
    { header: "Invited as", cell: (invitation) => invitation.role },
    { header: "Sent", cell: (invitation) => utcTime(invitation.createdAt), className: "whitespace-nowrap" },
    { header: "Link valid until", cell: (invitation) => utcTime(invitation.expiresAt), className: "whitespace-nowrap" },
    { header: "State", cell: (invitation) => (invitation.usedAt ? `accepted ${utcTime(invitation.usedAt)}` : invitation.expiresAt < Date.now() ? "expired" : "waiting") },
  ];

  return (
    <>
      <PageTitle title="Members">{canInvite ? "Invite people by e-mail and set what each may do." : "Who is in the team and with which role (read-only for your role)."}</PageTitle>
      {canInvite && <InviteForm />}
      <DataTable label="Members" columns={columns} rows={members.data} rowKey={(member) => member.id} error={members.error} empty="No members in this team yet." />
      {canInvite && (
        <section className="mt-8">
          <h2 className="text-lg font-medium text-ink-900">Invitations</h2>
          <DataTable label="Invitations" columns={invitationColumns} rows={invitations.data} rowKey={(invitation) => invitation.id} error={invitations.error} empty="No invitations sent yet." />
        </section>
      )}
    </>
  );
}

function useMembersChange<Input>(change: (input: Input) => Promise<unknown>, onDone?: (input: Input) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: change,
    onSuccess: (_result, input) => {
      queryClient.invalidateQueries({ queryKey: ["members"] });
      queryClient.invalidateQueries({ queryKey: ["invitations"] });
      onDone?.(input);
    },
  });
}

/** The roles an invitation can carry: what the user may give, administrators aside (the CLI makes them). */
const invitableRoles = (role: Role): Role[] => ASSIGNABLE_ROLES[role].filter((assignable) => assignable !== "administrator");

function InviteForm() {
  const { user, teamId, mustPickTeam } = useConsole();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useMembersChange(
    (form: HTMLFormElement) => {
      const data = new FormData(form);
      return adminSend("POST", "invitations", { email: data.get("email"), name: data.get("name") || undefined, role: data.get("role"), teamId });
    },
    (form) => {
      setSentTo(String(new FormData(form).get("email")));
      form.reset();
    },
  );
  if (mustPickTeam) return <p className="mt-4 text-sm text-ink-500">Pick a team in the bar above to invite someone.</p>;
  const state = formStateOf(invite.error);
  return (
    <form onSubmit={(event) => (event.preventDefault(), invite.mutate(event.currentTarget))} aria-label="Invite a member" className="mt-4 space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <FormMessage state={state} />
      {sentTo && !invite.error && <p role="status" className="text-sm text-ink-700">Invitation sent to {sentTo}. The link works once, for 72 hours.</p>}
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-64 flex-1"><Field label="E-mail" name="email" type="email" required state={state} /></div>
        <div className="min-w-48 flex-1"><Field label="Name (optional)" name="name" state={state} /></div>
        <label className="block text-sm font-medium text-ink-700">
          Role
          <select name="role" defaultValue="member" className="mt-1 block rounded-md border border-ink-100 bg-white px-3 py-2 text-ink-900">
            {invitableRoles(user.role).map((role) => (
              <option key={role}>{role}</option>
            ))}
          </select>
        </label>
        <button type="submit" disabled={invite.isPending} className="rounded-md bg-ink-900 px-4 py-2 text-sm font-medium text-white hover:bg-ink-700 disabled:opacity-60">Send invitation</button>
      </div>
    </form>
  );
}

function RoleCell({ member }: { member: Member }) {
  const { user } = useConsole();
  const change = useMembersChange((role: string) => adminSend("PATCH", `members/${member.id}`, { role }));
  const choices = invitableRoles(user.role);
  // Nobody changes their own role, and a manager cannot touch a role above what they may give.
  if (!can(user, "members:set-role") || member.id === user.id || !choices.includes(member.role)) return member.role;
  return (
    <span className="flex items-center gap-2">
      <select aria-label={`Role of ${member.name}`} value={member.role} disabled={change.isPending} onChange={(event) => change.mutate(event.target.value)} className="rounded-md border border-ink-100 bg-white px-2 py-1 text-sm text-ink-900">
        {choices.map((role) => (
          <option key={role}>{role}</option>
        ))}
      </select>
      {change.error && <span role="alert" className="text-xs text-shift-700">{change.error.message}</span>}
    </span>
  );
}
