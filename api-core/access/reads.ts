import { and, eq, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { apiKeys, invitations, teams, users } from "@/db/schema";
import type { Visibility } from "./permissions";
import type { InvitationView, KeyStatus, KeyView, Member, SessionUser, Team } from "./types";

type KeyRow = typeof apiKeys.$inferSelect;

export function keyStatus(row: Pick<KeyRow, "revokedAt" | "expiresAt">, now = Date.now()): KeyStatus {
  if (row.revokedAt !== null) return "revoked";
  if (row.expiresAt !== null && row.expiresAt <= now) return "expired";
  return "active";
}

export function toKeyView(row: KeyRow, now = Date.now()): KeyView {
  const { secretHash: _secretHash, ...view } = row;
  return { ...view, status: keyStatus(row, now) };
}

const sessionUserColumns = { id: users.id, email: users.email, name: users.name, role: users.role, teamId: users.teamId };

/** A user who may hold a session: joined (password set) and not disabled. */
export async function findSessionUser(id: string): Promise<SessionUser | null> {
  const row = await db().select({ ...sessionUserColumns, passwordHash: users.passwordHash, disabledAt: users.disabledAt }).from(users).where(eq(users.id, id)).get();
  if (!row || row.passwordHash === null || row.disabledAt !== null) return null;
  const { passwordHash: _p, disabledAt: _d, ...user } = row;
  return user;
}

export async function findUserByEmail(email: string) {
  return db().select().from(users).where(eq(users.email, email.toLowerCase())).get();
}

export async function findTeamBySlug(slug: string): Promise<Team | undefined> {
  return db().select().from(teams).where(eq(teams.slug, slug)).get();
}

export async function findTeam(id: string): Promise<Team | undefined> {
  return db().select().from(teams).where(eq(teams.id, id)).get();
}

/** The key with this secret hash, whatever its state; the guard decides what the state means. */
export async function findKeyByHash(secretHash: string): Promise<KeyRow | undefined> {
  return db().select().from(apiKeys).where(eq(apiKeys.secretHash, secretHash)).get();
}

export async function findKey(id: string): Promise<KeyRow | undefined> {
  return db().select().from(apiKeys).where(eq(apiKeys.id, id)).get();
}

export function keyConditions(visibility: Visibility, filter: { teamId?: string; userId?: string }): SQL[] {
  const where: SQL[] = [];
  for (const teamId of [visibility.teamId, filter.teamId]) if (teamId !== undefined) where.push(eq(apiKeys.teamId, teamId));
  for (const userId of [visibility.userId, filter.userId]) if (userId !== undefined) where.push(eq(apiKeys.userId, userId));
  return where;
}

export async function listTeams(visibility: Visibility): Promise<Team[]> {
  const where = visibility.teamId !== undefined ? eq(teams.id, visibility.teamId) : undefined;
  return db().select().from(teams).where(where).orderBy(teams.name);
}

export async function listMembers(visibility: Visibility, filter: { teamId?: string }): Promise<Member[]> {
  const where: SQL[] = [];
  for (const teamId of [visibility.teamId, filter.teamId]) if (teamId !== undefined) where.push(eq(users.teamId, teamId));
  const rows = await db()
    .select({ ...sessionUserColumns, passwordHash: users.passwordHash, createdAt: users.createdAt })
    .from(users)
    .where(and(...where))
    .orderBy(users.email);
  return rows.map(({ passwordHash, ...member }) => ({ ...member, pending: passwordHash === null }));
}

export async function listKeys(visibility: Visibility, filter: { teamId?: string; userId?: string }): Promise<KeyView[]> {
  const now = Date.now();
  const rows = await db().select().from(apiKeys).where(and(...keyConditions(visibility, filter))).orderBy(apiKeys.createdAt);
  return rows.map((row) => toKeyView(row, now));
}

export async function listInvitations(visibility: Visibility, filter: { teamId?: string }): Promise<InvitationView[]> {
  const where: SQL[] = [];
  for (const teamId of [visibility.teamId, filter.teamId]) if (teamId !== undefined) where.push(eq(invitations.teamId, teamId));
  const rows = await db().select().from(invitations).where(and(...where)).orderBy(invitations.createdAt);
  return rows.map(({ tokenHash: _tokenHash, ...invitation }) => invitation);
}
