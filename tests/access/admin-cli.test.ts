// The admin CLI (DESIGN §4): create-team, create-user, create-key (secret alone on the last line),
// list-keys, revoke-key; refusals exit non-zero with a message saying what to do.
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { parseKey } from "@/api-core/access/key-format";
import { useFreshDatabase } from "./fresh-database";

const database = useFreshDatabase();
const cli = (...args: string[]) =>
  promisify(execFile)(process.execPath, ["--import", "tsx", "scripts/admin.ts", ...args], { env: { ...process.env, DATABASE_URL: database.url(), COMOVA_PASSWORD: "cli-password-long-enough" } });

describe("npm run admin", () => {
  it("creates a team, a manager and a key, lists it by prefix, and revokes it", async () => {
    await cli("create-team", "--slug", "vela", "--name", "Vela Shell Survey");
    expect((await cli("create-user", "--email", "Ruth@Vela.example", "--name", "Ruth", "--role", "manager", "--team", "vela")).stdout).toMatch(/user_\S+ ruth@vela\.example manager/);
    const created = await cli("create-key", "--team", "vela", "--name", "pipeline", "--monthly-units", "500", "--per-minute", "30", "--scopes", "compute,profiles:write");
    const lines = created.stdout.trim().split("\n");
    const secret = lines.at(-1)!;
    expect(parseKey(secret).ok).toBe(true);
    expect(lines[0]).toContain("monthly-units=500 per-minute=30");
    const keyId = lines[0].split(" ")[1];
    const listed = (await cli("list-keys", "--team", "vela")).stdout;
    expect(listed).toContain(secret.slice(0, 10));
    expect(listed).not.toContain(secret);
    expect((await cli("revoke-key", keyId)).stdout).toContain("revoked");
    expect((await cli("list-keys")).stdout).toContain("\trevoked\t");
  }, 60_000);

  it("refuses bad input with exit 1 and a message, changing nothing", async () => {
    await expect(cli("create-key", "--team", "nowhere", "--name", "x")).rejects.toMatchObject({ code: 1, stderr: expect.stringContaining('No team with slug "nowhere"') });
    await expect(cli("create-key", "--team", "vela", "--name", "x", "--scopes", "everything")).rejects.toMatchObject({ code: 1 });
    expect((await cli("list-keys", "--team", "vela")).stdout.trim().split("\n")).toHaveLength(1);
    await expect(cli("frobnicate")).rejects.toMatchObject({ code: 2, stderr: expect.stringContaining("Usage") });
  }, 60_000);
});
