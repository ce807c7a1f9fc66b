import { mkdirSync } from "node:fs";
import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { databaseUrl, db, rawClient } from "./client";

/** Folder of a `file:` database, created if missing; null for a libSQL server URL. */
function localFolder(url: string): string | null {
  if (!url.startsWith("file:")) return null;
  const file = url.slice("file:".length).split("?")[0];
  return path.dirname(path.resolve(file));
}

/** Applies every migration in drizzle/ not yet applied; safe to run on every start. */
export async function migrateDatabase(migrationsFolder = path.resolve("drizzle")): Promise<void> {
  const url = databaseUrl();
  const folder = localFolder(url);
  if (folder) {
    mkdirSync(folder, { recursive: true });
    // WAL lets readers and one writer work at once; the setting persists in the file.
    await rawClient().execute("PRAGMA journal_mode=WAL");
  }
  await migrate(db(), { migrationsFolder });
}
