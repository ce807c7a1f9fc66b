import { and, eq, gte, inArray, lt, sql, type SQL } from "drizzle-orm";
import { keyConditions } from "@/api-core/access/reads";
import type { Visibility } from "@/api-core/access/permissions";
import { db } from "@/db/client";
import { apiKeys, requestLog, usage } from "@/db/schema";

export interface KeyUsage {
  keyId: string;
  teamId: string;
  name: string;
  prefix: string;
  monthlyUnits: number;
  units: number;
}

export interface UsageSummary {
  month: string;
  keys: KeyUsage[];
  teams: { teamId: string; units: number }[];
  days: { day: string; requests: number; evaluations: number }[];
}

/** Units per visible key and per team in one month ("YYYY-MM"), and calls and evaluations per UTC day of it. */
export async function usageSummary(visibility: Visibility, filter: { teamId?: string; keyId?: string }, month: string): Promise<UsageSummary> {
  const keyWhere = keyConditions(visibility, filter);
  if (filter.keyId !== undefined) keyWhere.push(eq(apiKeys.id, filter.keyId));
  const keyRows = await db()
    .select({ keyId: apiKeys.id, teamId: apiKeys.teamId, name: apiKeys.name, prefix: apiKeys.prefix, monthlyUnits: apiKeys.monthlyUnits, units: usage.units })
    .from(apiKeys)
    .leftJoin(usage, and(eq(usage.keyId, apiKeys.id), eq(usage.month, month)))
    .where(and(...keyWhere))
    .orderBy(apiKeys.createdAt);
  const keys = keyRows.map((row) => ({ ...row, units: row.units ?? 0 }));

  const teamUnits = new Map<string, number>();
  for (const key of keys) teamUnits.set(key.teamId, (teamUnits.get(key.teamId) ?? 0) + key.units);

  const start = Date.parse(`${month}-01T00:00:00Z`);
  const end = new Date(start).setUTCMonth(new Date(start).getUTCMonth() + 1);
  const logWhere: SQL[] = [gte(requestLog.at, start), lt(requestLog.at, end), inArray(requestLog.keyId, keys.map((key) => key.keyId))];
  const day = sql<string>`strftime('%Y-%m-%d', ${requestLog.at} / 1000, 'unixepoch')`;
  const days = keys.length === 0 ? [] : await db()
    .select({ day, requests: sql<number>`count(*)`, evaluations: sql<number>`coalesce(sum(${requestLog.evaluations}), 0)` })
    .from(requestLog)
    .where(and(...logWhere))
    .groupBy(day)
    .orderBy(day);

  return {
    month,
    keys,
    teams: [...teamUnits].map(([teamId, units]) => ({ teamId, units })),
    days: days.map((row) => ({ day: row.day, requests: Number(row.requests), evaluations: Number(row.evaluations) })),
  };
}
