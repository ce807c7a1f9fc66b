import { and, desc, eq, gte, lt, type SQL } from "drizzle-orm";
import { db, write } from "@/db/client";
import { apiKeys, requestLog } from "@/db/schema";

/** One keyed API call. Holds the key's id and visible prefix, never its secret; no query strings. */
export type RequestLogEntry = typeof requestLog.$inferSelect;
export type NewRequestLogEntry = Omit<RequestLogEntry, "id">;

/** Appends the entry and stamps the key's last use, in one atomic batch; returns the entry's id. */
export async function logRequest(entry: NewRequestLogEntry): Promise<number> {
  const [inserted] = await write((d) =>
    d.batch([
      d.insert(requestLog).values(entry).returning({ id: requestLog.id }),
      d.update(apiKeys).set({ lastUsedAt: entry.at }).where(eq(apiKeys.id, entry.keyId ?? "")),
    ]),
  );
  return inserted[0].id;
}

/**
 * Completes the entry of a streamed answer (a CSV catalog charges batch by batch while it streams):
 * the entry was written before the first byte left; this records what the whole stream evaluated
 * and, if the stream was cut off, the status of the problem that stopped it.
 */
export async function completeRequest(id: number, outcome: Pick<RequestLogEntry, "evaluations" | "status" | "durationMs">): Promise<void> {
  await write((d) => d.update(requestLog).set(outcome).where(eq(requestLog.id, id)));
}

export interface RequestLogFilter {
  teamId?: string;
  keyId?: string;
  route?: string;
  status?: number;
  /** Inclusive start and exclusive end, ms since the epoch. */
  from?: number;
  to?: number;
}

function conditions(filter: RequestLogFilter): SQL[] {
  const where: SQL[] = [];
  if (filter.teamId !== undefined) where.push(eq(requestLog.teamId, filter.teamId));
  if (filter.keyId !== undefined) where.push(eq(requestLog.keyId, filter.keyId));
  if (filter.route !== undefined) where.push(eq(requestLog.route, filter.route));
  if (filter.status !== undefined) where.push(eq(requestLog.status, filter.status));
  if (filter.from !== undefined) where.push(gte(requestLog.at, filter.from));
  if (filter.to !== undefined) where.push(lt(requestLog.at, filter.to));
  return where;
}

/** Newest first; `before` is the id of the last entry of the previous page (cursor pagination). */
export async function listRequests(filter: RequestLogFilter, page: { before?: number; limit: number }): Promise<RequestLogEntry[]> {
  const where = conditions(filter);
  if (page.before !== undefined) where.push(lt(requestLog.id, page.before));
  return db().select().from(requestLog).where(and(...where)).orderBy(desc(requestLog.id)).limit(page.limit);
}

/** Every matching entry, page by page, for the CSV export. */
export async function* allRequests(filter: RequestLogFilter, pageSize = 1000): AsyncGenerator<RequestLogEntry[]> {
  let before: number | undefined;
  for (;;) {
    const rows = await listRequests(filter, { before, limit: pageSize });
    if (rows.length === 0) return;
    yield rows;
    before = rows[rows.length - 1].id;
  }
}
