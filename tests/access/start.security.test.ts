// OWASP API8 (security misconfiguration): in production without SESSION_SECRET, Comova refuses to start.
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";

describe("npm start in production", () => {
  it("exits 1 with a clear message when SESSION_SECRET is missing", async () => {
    const start = promisify(execFile)(process.execPath, ["--import", "tsx", "scripts/start.ts"], {
      env: { ...process.env, NODE_ENV: "production", SESSION_SECRET: "", DATABASE_URL: "file:/nonexistent/never-created.db", PORT: "1" },
    });
    await expect(start).rejects.toMatchObject({ code: 1, stderr: expect.stringContaining("SESSION_SECRET is not set") });
  }, 30_000);
});
