import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import * as schema from "./schema";

export type Database = LibSQLDatabase<typeof schema>;

export const DEFAULT_DATABASE_URL = "file:./data/comova.db";

export function databaseUrl(): string {
  return process.env.DATABASE_URL || DEFAULT_DATABASE_URL;
}

/** Busy timeout for every pooled connection of a file database (the libSQL default, 0, fails at once). */
const BUSY_TIMEOUT_MS = 5000;

interface Connection {
  url: string;
  client: Client;
  db: Database;
}

// One connection per process, kept on globalThis so every Next.js bundle shares it.
const state = globalThis as unknown as { comovaConnection?: Connection; comovaWriteTail?: Promise<unknown> };

function open(url: string): Connection {
  const client = createClient({ url, authToken: process.env.DATABASE_AUTH_TOKEN, timeout: BUSY_TIMEOUT_MS });
  return { url, client, db: drizzle(client, { schema }) };
}

function connection(): Connection {
  const url = databaseUrl();
  if (!state.comovaConnection || state.comovaConnection.url !== url) state.comovaConnection = open(url);
  return state.comovaConnection;
}

/** The Drizzle database for reads. Writes go through {@link write}. */
export function db(): Database {
  return connection().db;
}

export function rawClient(): Client {
  return connection().client;
}

export function isBusyError(error: unknown): boolean {
  const text = String((error as { code?: string })?.code ?? "") + " " + String((error as Error)?.message ?? "");
  return /SQLITE_BUSY|database is locked/i.test(text);
}

/**
 * Replaces the client after an SQLITE_BUSY. A libSQL file connection that has seen BUSY can report
 * later writes as committed and roll them back when it closes (see ../shared/STACK.md, trap 1), so the
 * connection is closed and a fresh one opened before anything else runs on it.
 */
function replaceConnection(): void {
  const old = state.comovaConnection;
  state.comovaConnection = open(databaseUrl());
  old?.client.close();
}

/**
 * Runs a write on the per-process write queue: one write at a time in this process (libSQL calls are
 * synchronous underneath, so concurrent interactive transactions would block the event loop), and
 * the connection is replaced if the write met SQLITE_BUSY. A write that failed with BUSY was not
 * applied, so it is retried once on the fresh connection.
 */
export function write<T>(operation: (database: Database) => Promise<T>): Promise<T> {
  const run = async (): Promise<T> => {
    try {
      return await operation(db());
    } catch (error) {
      if (!isBusyError(error)) throw error;
      replaceConnection();
      try {
        return await operation(db());
      } catch (retryError) {
        if (isBusyError(retryError)) replaceConnection();
        throw retryError;
      }
    }
  };
  const result = (state.comovaWriteTail ?? Promise.resolve()).then(run, run);
  state.comovaWriteTail = result.catch(() => undefined);
  return result;
}

/** A cheap round trip, for the health check. */
export async function ping(): Promise<boolean> {
  try {
    await rawClient().execute("select 1");
    return true;
  } catch {
    return false;
  }
}
