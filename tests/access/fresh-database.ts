// A fresh migrated SQLite file for one test file's api-core unit tests (DATABASE_URL is read per call).
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll } from "vitest";
import { migrateDatabase } from "@/db/migrate";

export function useFreshDatabase(): { url: () => string } {
  let folder = "";
  beforeAll(async () => {
    folder = mkdtempSync(path.join(tmpdir(), "comova-unit-"));
    process.env.DATABASE_URL = `file:${path.join(folder, "unit.db")}`;
    await migrateDatabase();
  });
  afterAll(() => rmSync(folder, { recursive: true, force: true }));
  return { url: () => process.env.DATABASE_URL! };
}
