"use client";
import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { createContext, useContext, useEffect, useState } from "react";
import { reachOf, type Permission } from "@/api-core/access/permissions";
import type { SessionUser, Team } from "@/api-core/access/types";
import { signOutAction } from "./actions";
import { adminGet } from "./admin-api";

interface ConsoleContext {
  user: SessionUser;
  /** The team filter of admin API reads: an administrator's picked team; undefined is all the user may see. */
  teamId: string | undefined;
  /** An administrator looking at every team: tables name each row's team; issuing and inviting need one picked. */
  mustPickTeam: boolean;
  teams: Team[];
}

const Console = createContext<ConsoleContext | null>(null);

export function useConsole(): ConsoleContext {
  const context = useContext(Console);
  if (!context) throw new Error("useConsole outside the console layout");
  return context;
}

/** Whether the user's role has a permission; only to hide what the server would refuse anyway. */
export const can = (user: SessionUser, permission: Permission) => reachOf(user.role, permission) !== null;

const PAGES: { href: string; label: string; permission: Permission }[] = [
  { href: "/console", label: "Keys", permission: "keys:read" },
  { href: "/console/members", label: "Members", permission: "members:read" },
  { href: "/console/usage", label: "Usage", permission: "usage:read" },
  { href: "/console/log", label: "Request log", permission: "request-log:read" },
  { href: "/console/audit", label: "Audit trail", permission: "audit-trail:read" },
  { href: "/console/outbox", label: "Outbox", permission: "outbox:read" },
];

const PICKED_TEAM = "comova.console.team";

export function ConsoleShell({ user, children }: { user: SessionUser; children: React.ReactNode }) {
  const [queryClient] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 5_000, retry: false } } }));
  return (
    <QueryClientProvider client={queryClient}>
      <Shell user={user}>{children}</Shell>
    </QueryClientProvider>
  );
}

function Shell({ user, children }: { user: SessionUser; children: React.ReactNode }) {
  const isAdministrator = user.role === "administrator";
  const [pickedTeam, setPickedTeam] = useState<string | undefined>(undefined);
  // Remembered per browser so that a reload keeps the administrator's team.
  useEffect(() => setPickedTeam((isAdministrator && localStorage.getItem(PICKED_TEAM)) || undefined), [isAdministrator]);
  const teams = useQuery({ queryKey: ["teams"], queryFn: () => adminGet<{ teams: Team[] }>("teams"), enabled: isAdministrator });
  const pick = (teamId: string) => {
    localStorage.setItem(PICKED_TEAM, teamId);
    setPickedTeam(teamId || undefined);
  };
  const pathname = usePathname();
  const context = { user, teamId: pickedTeam, mustPickTeam: isAdministrator && pickedTeam === undefined, teams: teams.data?.teams ?? [] };
  return (
    <Console.Provider value={context}>
      <header className="bg-ink-900 text-white">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-6 py-3">
          <Link href="/console" className="text-lg font-bold tracking-tight">
            Comova <span className="font-normal text-shift-400">console</span>
          </Link>
          <nav aria-label="Console" className="flex flex-wrap gap-1">
            {PAGES.filter((page) => can(user, page.permission)).map((page) => (
              <Link
                key={page.href}
                href={page.href}
                aria-current={pathname === page.href ? "page" : undefined}
                className="rounded-md px-2.5 py-1.5 text-sm text-ink-100 hover:bg-ink-700 aria-[current=page]:bg-ink-700 aria-[current=page]:text-white"
              >
                {page.label}
              </Link>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-3 text-sm">
            {/* Shown once the teams are known, so that the remembered team is never displayed as "All teams". */}
            {isAdministrator && teams.data && (
              <select aria-label="Team" value={pickedTeam ?? ""} onChange={(event) => pick(event.target.value)} className="max-w-44 rounded-md bg-ink-700 px-2 py-1 text-white">
                <option value="">All teams</option>
                {context.teams.map((team) => (
                  <option key={team.id} value={team.id}>{team.name}</option>
                ))}
              </select>
            )}
            <span>
              <span className="font-medium">{user.name}</span> <span className="rounded bg-ink-700 px-1.5 py-0.5 text-xs text-ink-100">{user.role}</span>
            </span>
            <form action={signOutAction}>
              <button className="rounded-md border border-ink-500 px-2.5 py-1 text-ink-100 hover:border-shift-400 hover:text-white">Sign out</button>
            </form>
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-6xl px-6 py-8">{children}</main>
    </Console.Provider>
  );
}

export function PageTitle({ title, children }: { title: string; children?: React.ReactNode }) {
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">{title}</h1>
        {children && <p className="mt-1 text-sm text-ink-500">{children}</p>}
      </div>
    </div>
  );
}

/** The name of a team for administrators' tables. */
export function useTeamName(): (teamId: string | null) => string {
  const { teams } = useConsole();
  return (teamId) => teams.find((team) => team.id === teamId)?.name ?? teamId ?? "—";
}
