// Durability under contention (../shared/STACK.md, trap 1: libSQL can roll back acknowledged writes
// after SQLITE_BUSY). Two processes write to one database file at once; every acknowledged row must
// be there afterwards, read by a third, fresh connection.
import { execFile } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { createClient } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";

const run = promisify(execFile);
const folder = mkdtempSync(path.join(tmpdir(), "comova-writers-"));
const databaseUrl = `file:${path.join(folder, "writers.db")}`;
const ROWS_PER_WRITER = 400;

afterAll(() => rmSync(folder, { recursive: true, force: true }));

async function startWriter(name: string) {
  const { stdout } = await run(process.execPath, ["--import", "tsx", "tests/db/concurrent-writer.ts", name, String(ROWS_PER_WRITER)], {
    env: { ...process.env, DATABASE_URL: databaseUrl },
  });
  return JSON.parse(stdout.trim().split("\n").pop()!) as { writer: string; acknowledged: number };
}

describe("two processes writing to one SQLite file", () => {
  it("keeps every acknowledged row", async () => {
    await run(process.execPath, ["--import", "tsx", "-e", "const m = await import('./db/migrate.ts'); await m.migrateDatabase();"], {
      env: { ...process.env, DATABASE_URL: databaseUrl },
    });
    const results = await Promise.all([startWriter("alpha"), startWriter("beta")]);
    const reader = createClient({ url: databaseUrl });
    for (const { writer, acknowledged } of results) {
      const row = await reader.execute({ sql: "select count(*) as n from audit_trail where target_id = ?", args: [writer] });
      expect(acknowledged).toBe(ROWS_PER_WRITER);
      expect(Number(row.rows[0].n)).toBe(acknowledged);
    }
    reader.close();
  }, 120_000);
});
