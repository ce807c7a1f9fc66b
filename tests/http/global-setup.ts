// Starts the real built server (scripts/start.ts → next start) on a free port with a fresh temporary
// database, waits for /api/v1/health, and hands the base URL and database URL to the tests.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

async function waitForHealth(baseUrl: string, server: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`The server exited early:\n${output()}`);
    try {
      const response = await fetch(`${baseUrl}/api/v1/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`The server did not become healthy within 60 s:\n${output()}`);
}

export default async function setup(project: TestProject) {
  const folder = mkdtempSync(path.join(tmpdir(), "comova-http-"));
  const databaseUrl = `file:${path.join(folder, "test.db")}`;
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  let log = "";
  const server = spawn(process.execPath, ["--import", "tsx", "scripts/start.ts"], {
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), COMOVA_DEMO: "1", NEXT_TELEMETRY_DISABLED: "1" },
    stdio: ["ignore", "pipe", "pipe"],
    detached: true,
  });
  server.stdout!.on("data", (chunk) => (log += chunk));
  server.stderr!.on("data", (chunk) => (log += chunk));
  await waitForHealth(baseUrl, server, () => log);
  project.provide("baseUrl", baseUrl);
  project.provide("databaseUrl", databaseUrl);
  process.env.COMOVA_TEST_DATABASE_URL = databaseUrl;

  return async () => {
    // The start script spawns next; kill the whole process group.
    try {
      process.kill(-server.pid!, "SIGTERM");
    } catch {
      // already gone
    }
    await new Promise((r) => setTimeout(r, 300));
    rmSync(folder, { recursive: true, force: true });
  };
}
