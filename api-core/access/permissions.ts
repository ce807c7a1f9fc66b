import type { Role } from "@/db/schema";

/**
 * How far a permission reaches: every team, the user's own team, or only the user's own keys.
 * Administrators belong to no team and see everything; auditors read their own team only.
 */
export type Reach = "all" | "team" | "own";

/** The one permission table. A role missing from a row has no access to it (403). */
export const PERMISSIONS = {
  "teams:create": { administrator: "all" },
  "teams:read": { administrator: "all", manager: "team", auditor: "team", member: "team" },
  "members:read": { administrator: "all", manager: "team", auditor: "team" },
  "members:invite": { administrator: "all", manager: "team" },
  "members:set-role": { administrator: "all", manager: "team" },
  "keys:read": { administrator: "all", manager: "team", auditor: "team", member: "own" },
  "keys:manage": { administrator: "all", manager: "team", member: "own" },
  "usage:read": { administrator: "all", manager: "team", auditor: "team", member: "own" },
  "request-log:read": { administrator: "all", auditor: "team" },
  "audit-trail:read": { administrator: "all", auditor: "team" },
  "outbox:read": { administrator: "all" },
} as const satisfies Record<string, Partial<Record<Role, Reach>>>;

export type Permission = keyof typeof PERMISSIONS;

/** Roles a role may hand out (invite with or change to): managers never create administrators. */
export const ASSIGNABLE_ROLES: Record<Role, readonly Role[]> = {
  administrator: ["administrator", "manager", "auditor", "member"],
  manager: ["manager", "auditor", "member"],
  auditor: [],
  member: [],
};

export function reachOf(role: Role, permission: Permission): Reach | null {
  return (PERMISSIONS[permission] as Partial<Record<Role, Reach>>)[role] ?? null;
}

/** Matches no team: what a team-bound user's filter for another team turns into. */
const NO_TEAM = "\u0000no-team";

/** The rows a user may see under one permission: no filter, a team, or a team and an owner. */
export interface Visibility {
  teamId?: string;
  userId?: string;
}

export function visibilityFor(user: { id: string; role: Role; teamId: string | null }, reach: Reach): Visibility {
  if (reach === "all") return {};
  // A team-bound role without a team sees nothing.
  const teamId = user.teamId ?? NO_TEAM;
  return reach === "team" ? { teamId } : { teamId, userId: user.id };
}

/** Whether a row (of a team, optionally owned by a user) is inside a visibility. */
export function canSee(visibility: Visibility, row: { teamId: string | null; userId?: string | null }): boolean {
  if (visibility.teamId !== undefined && row.teamId !== visibility.teamId) return false;
  if (visibility.userId !== undefined && row.userId !== visibility.userId) return false;
  return true;
}

/** The team to filter by: the user's bound wins, and asking for another team finds nothing (not an error). */
export function teamWithin(visibility: Visibility, requested: string | undefined): string | undefined {
  if (visibility.teamId === undefined) return requested;
  return requested === undefined || requested === visibility.teamId ? visibility.teamId : NO_TEAM;
}
