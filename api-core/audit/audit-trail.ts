import { and, desc, eq, lt, type SQL } from "drizzle-orm";
import { db, write } from "@/db/client";
import { auditTrail } from "@/db/schema";

/**
 * The audit trail of console and admin actions: who did what, to what, when. Append-only: this
 * module only inserts, and a trigger in the database aborts any UPDATE or DELETE of audit_trail.
 */
export type AuditAction =
  | "team.created"
  | "user.created"
  | "member.invited"
  | "member.joined"
  | "member.role-changed"
  | "key.issued"
  | "key.revoked"
  | "key.rotated"
  | "profile.created";

export interface AuditEvent {
  /** Who acted: a user (id and e-mail), an API key (id and its prefix as `email`), or null for the CLI. */
  actor: { id: string; email?: string | null } | null;
  teamId: string | null;
  action: AuditAction;
  targetType: string;
  targetId: string | null;
  detail?: Record<string, unknown>;
}

/** The insert of one event, to put in a `d.batch([...])` beside the change it records. */
export function auditInsert(event: AuditEvent, database = db(), now = Date.now()) {
  return database.insert(auditTrail).values({
    at: now,
    actorId: event.actor?.id ?? null,
    actorEmail: event.actor?.email ?? null,
    teamId: event.teamId,
    action: event.action,
    targetType: event.targetType,
    targetId: event.targetId,
    detail: event.detail ?? null,
  });
}

/** Records one event on its own (e.g. a cosmology profile created through the API). */
export async function recordAudit(event: AuditEvent): Promise<void> {
  await write((d) => auditInsert(event, d));
}

export type AuditEntry = typeof auditTrail.$inferSelect;

export interface AuditFilter {
  teamId?: string;
  action?: string;
}

/** Newest first; `before` is the id of the last entry of the previous page. */
export async function listAudit(filter: AuditFilter, page: { before?: number; limit: number }): Promise<AuditEntry[]> {
  const conditions: SQL[] = [];
  if (filter.teamId !== undefined) conditions.push(eq(auditTrail.teamId, filter.teamId));
  if (filter.action !== undefined) conditions.push(eq(auditTrail.action, filter.action));
  if (page.before !== undefined) conditions.push(lt(auditTrail.id, page.before));
  return db().select().from(auditTrail).where(and(...conditions)).orderBy(desc(auditTrail.id)).limit(page.limit);
}
