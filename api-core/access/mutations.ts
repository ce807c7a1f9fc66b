import { createHash, randomBytes, randomUUID } from "node:crypto";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { db, write } from "@/db/client";
import { apiKeys, invitations, teams, users, type Role } from "@/db/schema";
import { auditInsert } from "@/api-core/audit/audit-trail";
import { ProblemError } from "@/api-core/http/problem";
import { sendMail } from "@/api-core/mail/mailer";
import { monthOf } from "@/api-core/quota/monthly";
import { generateKey, hashKey, visiblePrefix } from "./key-format";
import { hashPassword } from "./password";
import { ASSIGNABLE_ROLES, canSee, type Visibility } from "./permissions";
import { findKey, findSessionUser, findTeam, findTeamBySlug, findUserByEmail, toKeyView } from "./reads";
import {
  DEFAULT_MONTHLY_UNITS,
  DEFAULT_PER_MINUTE,
  INVITATION_HOURS,
  type IssuedKey,
  type KeyScope,
  type KeyView,
  type SessionUser,
  type Team,
} from "./types";

/** Who acts: a signed-in user, or null for the admin CLI (an operator on the host). */
type Actor = SessionUser | null;

const actorOf = (actor: Actor) => (actor ? { id: actor.id, email: actor.email } : null);

const notFound = (what: string, id: string) =>
  new ProblemError(404, "not-found", `No ${what} with id ${id} is visible to you. List them with GET /api/v1/admin/${what}s.`);

export async function createTeam(input: { slug: string; name: string }, actor: Actor): Promise<Team> {
  if (await findTeamBySlug(input.slug)) throw new ProblemError(409, "team-exists", `A team with slug "${input.slug}" already exists; choose another slug.`);
  const team = { id: `team_${randomUUID()}`, slug: input.slug, name: input.name, createdAt: Date.now() };
  await write((d) =>
    d.batch([d.insert(teams).values(team), auditInsert({ actor: actorOf(actor), teamId: team.id, action: "team.created", targetType: "team", targetId: team.id, detail: { slug: team.slug } }, d)]),
  );
  return team;
}

/** Creates a user who can sign in at once (the admin CLI's way; the console invites instead). */
export async function createUser(input: { email: string; name: string; role: Role; teamId: string | null; password: string }, actor: Actor): Promise<SessionUser> {
  const email = input.email.toLowerCase();
  if (await findUserByEmail(email)) throw new ProblemError(409, "user-exists", `A user with e-mail ${email} already exists.`);
  if ((input.role === "administrator") !== (input.teamId === null)) {
    throw new ProblemError(422, "invalid-parameters", "Administrators belong to no team; every other role needs a team.");
  }
  const user = { id: `user_${randomUUID()}`, email, name: input.name, role: input.role, teamId: input.teamId };
  const passwordHash = await hashPassword(input.password);
  await write((d) =>
    d.batch([
      d.insert(users).values({ ...user, passwordHash, createdAt: Date.now() }),
      auditInsert({ actor: actorOf(actor), teamId: user.teamId, action: "user.created", targetType: "user", targetId: user.id, detail: { email, role: user.role } }, d),
    ]),
  );
  return user;
}

export interface KeyRequest {
  name: string;
  teamId?: string;
  userId?: string | null;
  scopes?: KeyScope[];
  monthlyUnits?: number;
  perMinute?: number;
  expiresAt?: number | null;
}

/**
 * Issues a key inside what the actor may manage: a member's keys are always their own, in their team,
 * with at most the default limits (they cannot raise their own quota); a manager's are in their team.
 */
export async function issueKey(request: KeyRequest, visibility: Visibility, actor: Actor): Promise<IssuedKey> {
  const teamId = visibility.teamId ?? request.teamId;
  if (!teamId) throw new ProblemError(422, "invalid-parameters", "teamId: administrators must say which team the key belongs to.");
  if (request.teamId !== undefined && request.teamId !== teamId) throw notFound("team", request.teamId);
  if (!(await findTeam(teamId))) throw notFound("team", teamId);
  const userId = visibility.userId ?? request.userId ?? null;
  if (userId !== null) {
    const owner = await findSessionUser(userId);
    if (!owner || owner.teamId !== teamId) throw new ProblemError(422, "invalid-parameters", `userId: ${userId} is not a member of team ${teamId}.`);
  }
  const monthlyUnits = request.monthlyUnits ?? DEFAULT_MONTHLY_UNITS;
  const perMinute = request.perMinute ?? DEFAULT_PER_MINUTE;
  if (visibility.userId !== undefined && (monthlyUnits > DEFAULT_MONTHLY_UNITS || perMinute > DEFAULT_PER_MINUTE)) {
    throw new ProblemError(403, "forbidden", `Members may issue keys with at most ${DEFAULT_MONTHLY_UNITS} monthly units and ${DEFAULT_PER_MINUTE} calls per minute; ask a team manager for more.`);
  }
  const secret = generateKey();
  const now = Date.now();
  const row = {
    id: `key_${randomUUID()}`,
    teamId,
    userId,
    name: request.name,
    prefix: visiblePrefix(secret),
    secretHash: hashKey(secret),
    scopes: [...new Set(request.scopes ?? ["compute"])],
    monthlyUnits,
    perMinute,
    expiresAt: request.expiresAt ?? null,
    revokedAt: null,
    replacedBy: null,
    lastUsedAt: null,
    createdAt: now,
  };
  await write((d) =>
    d.batch([
      d.insert(apiKeys).values(row),
      auditInsert({ actor: actorOf(actor), teamId, action: "key.issued", targetType: "api_key", targetId: row.id, detail: { prefix: row.prefix, name: row.name, scopes: row.scopes } }, d, now),
    ]),
  );
  return { key: toKeyView(row, now), secret };
}

async function visibleKey(id: string, visibility: Visibility) {
  const row = await findKey(id);
  // Another team's key answers exactly like a missing one (OWASP API1: no object-level leak).
  if (!row || !canSee(visibility, row)) throw notFound("key", id);
  return row;
}

export async function revokeKey(id: string, visibility: Visibility, actor: Actor): Promise<KeyView> {
  const row = await visibleKey(id, visibility);
  if (row.revokedAt !== null) return toKeyView(row);
  const now = Date.now();
  await write((d) =>
    d.batch([
      d.update(apiKeys).set({ revokedAt: now }).where(eq(apiKeys.id, id)),
      auditInsert({ actor: actorOf(actor), teamId: row.teamId, action: "key.revoked", targetType: "api_key", targetId: id, detail: { prefix: row.prefix } }, d, now),
    ]),
  );
  return toKeyView({ ...row, revokedAt: now }, now);
}

/**
 * Replaces a key with a new secret of the same settings. The old key keeps working for the overlap
 * (so deployments can switch over), then expires; this month's spent units move with it, so rotating
 * does not reset the quota.
 */
export async function rotateKey(id: string, overlapSeconds: number, visibility: Visibility, actor: Actor): Promise<IssuedKey & { previous: KeyView }> {
  const old = await visibleKey(id, visibility);
  const now = Date.now();
  if (old.revokedAt !== null || (old.expiresAt !== null && old.expiresAt <= now)) {
    throw new ProblemError(409, "key-inactive", `Key ${old.prefix}… is ${old.revokedAt !== null ? "revoked" : "expired"}; issue a new key instead of rotating it.`);
  }
  const secret = generateKey();
  const next = { ...old, id: `key_${randomUUID()}`, prefix: visiblePrefix(secret), secretHash: hashKey(secret), replacedBy: null, lastUsedAt: null, createdAt: now };
  const oldExpiresAt = Math.min(old.expiresAt ?? Infinity, now + overlapSeconds * 1000);
  const month = monthOf(now);
  await write((d) =>
    d.batch([
      d.insert(apiKeys).values(next),
      d.update(apiKeys).set({ expiresAt: oldExpiresAt, replacedBy: next.id }).where(eq(apiKeys.id, old.id)),
      d.run(sql`INSERT INTO usage (key_id, month, units) SELECT ${next.id}, month, units FROM usage WHERE key_id = ${old.id} AND month = ${month}`),
      auditInsert(
        { actor: actorOf(actor), teamId: old.teamId, action: "key.rotated", targetType: "api_key", targetId: old.id, detail: { prefix: old.prefix, replacedBy: next.id, newPrefix: next.prefix, oldExpiresAt } },
        d,
        now,
      ),
    ]),
  );
  return { key: toKeyView(next, now), secret, previous: toKeyView({ ...old, expiresAt: oldExpiresAt, replacedBy: next.id }, now) };
}

function assertAssignable(actor: Actor, role: Role): void {
  if (actor && !ASSIGNABLE_ROLES[actor.role].includes(role)) {
    throw new ProblemError(403, "forbidden", `A ${actor.role} cannot give the role ${role}; roles you may give: ${ASSIGNABLE_ROLES[actor.role].join(", ") || "none"}.`);
  }
}

const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

/**
 * Invites someone to a team: a pending user row (no password), an invitation holding only the hash of
 * a random token, and an e-mail with the single-use link that sets the password.
 */
export async function inviteMember(
  input: { email: string; name?: string; role: Exclude<Role, "administrator">; teamId?: string },
  visibility: Visibility,
  actor: SessionUser,
  origin: string,
): Promise<{ invitationId: string; userId: string; expiresAt: number }> {
  assertAssignable(actor, input.role);
  const teamId = visibility.teamId ?? input.teamId;
  if (!teamId) throw new ProblemError(422, "invalid-parameters", "teamId: administrators must say which team to invite to.");
  if (input.teamId !== undefined && input.teamId !== teamId) throw notFound("team", input.teamId);
  const team = await findTeam(teamId);
  if (!team) throw notFound("team", teamId);
  const email = input.email.toLowerCase();
  const existing = await findUserByEmail(email);
  if (existing && (existing.passwordHash !== null || existing.teamId !== teamId)) {
    throw new ProblemError(409, "user-exists", `${email} already has a Comova account; change their role instead of inviting them.`);
  }
  const token = randomBytes(32).toString("base64url");
  const now = Date.now();
  const expiresAt = now + INVITATION_HOURS * 3600_000;
  const userId = existing?.id ?? `user_${randomUUID()}`;
  const invitationId = `inv_${randomUUID()}`;
  await write((d) =>
    d.batch([
      d
        .insert(users)
        .values({ id: userId, email, name: input.name ?? email.split("@")[0], role: input.role, teamId, passwordHash: null, createdAt: now })
        .onConflictDoUpdate({ target: users.id, set: { role: input.role } }),
      d.insert(invitations).values({ id: invitationId, teamId, email, role: input.role, tokenHash: hashToken(token), invitedBy: actor.id, expiresAt, createdAt: now }),
      auditInsert({ actor: actorOf(actor), teamId, action: "member.invited", targetType: "user", targetId: userId, detail: { email, role: input.role } }, d, now),
    ]),
  );
  const link = `${origin}/console/accept-invitation?token=${token}`;
  await sendMail({
    to: email,
    subject: `You are invited to ${team.name} on Comova`,
    text: [
      `${actor.name} invited you to join ${team.name} on Comova as ${input.role}.`,
      "",
      `Choose your password here (the link works once, until ${new Date(expiresAt).toISOString()}):`,
      link,
      "",
      "If you did not expect this e-mail, ignore it.",
    ].join("\n"),
  });
  return { invitationId, userId, expiresAt };
}

/** Uses an invitation link once: sets the invited user's password and name. */
export async function acceptInvitation(input: { token: string; name?: string; password: string }): Promise<SessionUser> {
  const passwordHash = await hashPassword(input.password);
  const now = Date.now();
  const tokenHash = hashToken(input.token);
  // The claim is one conditional update, so two uses at once cannot both succeed.
  const claimed = await write((d) =>
    d
      .update(invitations)
      .set({ usedAt: now })
      .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.usedAt), gt(invitations.expiresAt, now)))
      .returning()
      .get(),
  );
  if (!claimed) throw await invitationProblem(tokenHash);
  const user = await findUserByEmail(claimed.email);
  if (!user) throw new ProblemError(409, "invitation-used", "The invited account no longer exists; ask your team manager for a new invitation.");
  const name = input.name ?? user.name;
  await write((d) =>
    d.batch([
      d.update(users).set({ passwordHash, name, role: claimed.role, teamId: claimed.teamId }).where(eq(users.id, user.id)),
      auditInsert({ actor: { id: user.id, email: user.email }, teamId: claimed.teamId, action: "member.joined", targetType: "user", targetId: user.id, detail: { invitationId: claimed.id } }, d, now),
    ]),
  );
  return { id: user.id, email: user.email, name, role: claimed.role, teamId: claimed.teamId };
}

async function invitationProblem(tokenHash: string): Promise<ProblemError> {
  const row = await db().select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).get();
  if (!row) return new ProblemError(404, "invitation-not-found", "This invitation link is not valid; check that it was copied whole, or ask your team manager for a new one.");
  if (row.usedAt !== null) return new ProblemError(409, "invitation-used", "This invitation link was already used; sign in with the password you chose, or ask your team manager for a new invitation.");
  return new ProblemError(409, "invitation-expired", `This invitation link expired at ${new Date(row.expiresAt).toISOString()}; ask your team manager for a new one.`);
}

export async function setRole(userId: string, role: Role, visibility: Visibility, actor: SessionUser): Promise<SessionUser> {
  assertAssignable(actor, role);
  if (userId === actor.id) throw new ProblemError(403, "forbidden", "You cannot change your own role; ask another manager or an administrator.");
  const target = await db().select().from(users).where(eq(users.id, userId)).get();
  if (!target || !canSee(visibility, target)) throw notFound("member", userId);
  assertAssignable(actor, target.role);
  if ((role === "administrator") !== (target.teamId === null)) {
    throw new ProblemError(422, "invalid-parameters", "role: administrators belong to no team; a team member cannot become one here (use the admin CLI), nor a team-less administrator a team role.");
  }
  await write((d) =>
    d.batch([
      d.update(users).set({ role }).where(eq(users.id, userId)),
      auditInsert({ actor: actorOf(actor), teamId: target.teamId, action: "member.role-changed", targetType: "user", targetId: userId, detail: { from: target.role, to: role } }, d),
    ]),
  );
  return { id: target.id, email: target.email, name: target.name, role, teamId: target.teamId };
}
