// Starts the real built server (scripts/start.ts → next start) on a free port with a fresh temporary
// database, waits for /api/v1/health, and hands the base URL and database URL to the tests.
import { execFile, spawn, type ChildProcess } from "node:child_process";
import { appendFileSync, mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    databaseUrl: string;
    /** A key of team "http-tests" with scopes compute and profiles:write and limits too high to reach. */
    computeKey: string;
    /** Everything the server printed, for tests that check no secret reaches its output. */
    serverLogFile: string;
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

/** Creates the compute tests' team and key with the admin CLI; its secret is the CLI's last line. */
async function createComputeKey(databaseUrl: string): Promise<string> {
  const admin = (...args: string[]) => promisify(execFile)(process.execPath, ["--import", "tsx", "scripts/admin.ts", ...args], { env: { ...process.env, DATABASE_URL: databaseUrl } });
  await admin("create-team", "--slug", "http-tests", "--name", "HTTP tests");
  const { stdout } = await admin("create-key", "--team", "http-tests", "--name", "HTTP tests", "--scopes", "compute,profiles:write", "--monthly-units", "1000000000", "--per-minute", "1000000");
  return stdout.trim().split("\n").pop()!;
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
  const serverLogFile = path.join(folder, "server.log");
  for (const stream of [server.stdout!, server.stderr!]) stream.on("data", (chunk) => ((log += chunk), appendFileSync(serverLogFile, chunk)));
  await waitForHealth(baseUrl, server, () => log);
  project.provide("baseUrl", baseUrl);
  project.provide("databaseUrl", databaseUrl);
  project.provide("computeKey", await createComputeKey(databaseUrl));
  project.provide("serverLogFile", serverLogFile);
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
