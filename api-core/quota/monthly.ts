import { and, eq, sql } from "drizzle-orm";
import { db, write } from "@/db/client";
import { usage } from "@/db/schema";

/** The calendar month (UTC) a time falls in, as stored in usage.month: "YYYY-MM". */
export function monthOf(time: number): string {
  return new Date(time).toISOString().slice(0, 7);
}

/** Start of the next UTC month: when a monthly quota resets. */
export function monthResetsAt(time: number): number {
  const date = new Date(time);
  return Date.UTC(date.getUTCFullYear(), date.getUTCMonth() + 1, 1);
}

export function monthStartsAt(time: number): number {
  const date = new Date(time);
  return Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), 1);
}

export type ChargeResult = { charged: true; used: number } | { charged: false };

/**
 * Spends `units` of a key's monthly quota, or nothing if they do not fit. One conditional statement,
 * so concurrent calls (in this process or any other sharing the database) can never overspend: the
 * insert runs only if the units fit an empty month, the update only if they still fit, and a row
 * comes back only when one of them ran.
 */
export async function chargeUnits(keyId: string, limit: number, units: number, now = Date.now()): Promise<ChargeResult> {
  const month = monthOf(now);
  const rows = await write((d) =>
    d.all<{ units: number }>(sql`
      INSERT INTO usage (key_id, month, units) SELECT ${keyId}, ${month}, ${units} WHERE ${units} <= ${limit}
      ON CONFLICT (key_id, month) DO UPDATE SET units = usage.units + excluded.units
        WHERE usage.units + excluded.units <= ${limit}
      RETURNING units`),
  );
  return rows.length === 1 ? { charged: true, used: Number(rows[0].units) } : { charged: false };
}

export async function unitsUsed(keyId: string, now = Date.now()): Promise<number> {
  const row = await db()
    .select({ units: usage.units })
    .from(usage)
    .where(and(eq(usage.keyId, keyId), eq(usage.month, monthOf(now))))
    .get();
  return row?.units ?? 0;
}
