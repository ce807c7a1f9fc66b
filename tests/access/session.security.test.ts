// Session tokens (OWASP API2: broken authentication): only our HS256 signature, unexpired, is accepted.
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { SignJWT, UnsecuredJWT } from "jose";
import { afterEach, describe, expect, it, vi } from "vitest";
import { sessionCookies, sessionSecret, signSession, verifySession } from "@/api-core/access/session";

const SECRET = "a-test-session-secret-of-plenty-characters";

afterEach(() => vi.unstubAllEnvs());

describe("session tokens", () => {
  it("round-trips a user id", async () => {
    vi.stubEnv("SESSION_SECRET", SECRET);
    expect(await verifySession(await signSession("user_1"))).toBe("user_1");
  });

  it("rejects a tampered payload", async () => {
    vi.stubEnv("SESSION_SECRET", SECRET);
    const [header, , signature] = (await signSession("user_1")).split(".");
    const forged = Buffer.from(JSON.stringify({ sub: "user_admin", iss: "comova", aud: "comova-console", exp: 9999999999 })).toString("base64url");
    expect(await verifySession(`${header}.${forged}.${signature}`)).toBeNull();
  });

  it("rejects an expired token", async () => {
    vi.stubEnv("SESSION_SECRET", SECRET);
    expect(await verifySession(await signSession("user_1", Date.now() - 9 * 3600_000))).toBeNull();
  });

  it("rejects a token signed with another secret, and an unsigned (alg none) one", async () => {
    vi.stubEnv("SESSION_SECRET", SECRET);
    const foreign = await new SignJWT({}).setProtectedHeader({ alg: "HS256" }).setSubject("user_1").setIssuer("comova").setAudience("comova-console").setExpirationTime("1h").sign(new TextEncoder().encode("some-other-secret-of-plenty-characters"));
    expect(await verifySession(foreign)).toBeNull();
    const unsigned = new UnsecuredJWT({}).setSubject("user_1").setIssuer("comova").setAudience("comova-console").setExpirationTime("1h").encode();
    expect(await verifySession(unsigned)).toBeNull();
  });

  it("sets httpOnly cookies: Lax for the console, Strict for the API, Secure only over https", () => {
    const [consoleCookie, apiCookie] = sessionCookies("t", true);
    expect(consoleCookie).toMatch(/^comova_session=t; Path=\/console; SameSite=Lax; HttpOnly; Max-Age=28800; Secure$/);
    expect(apiCookie).toMatch(/^comova_api_session=t; Path=\/api\/v1\/admin; SameSite=Strict; HttpOnly; Max-Age=28800; Secure$/);
    expect(sessionCookies("t", false).join()).not.toContain("Secure");
    expect(sessionCookies(null, false)[0]).toContain("Max-Age=0");
  });
});

describe("session secret", () => {
  it("refuses to run in production without SESSION_SECRET, with a clear message", () => {
    vi.stubEnv("SESSION_SECRET", "");
    vi.stubEnv("NODE_ENV", "production");
    expect(() => sessionSecret()).toThrow(/SESSION_SECRET is not set/);
  });

  it("refuses a short SESSION_SECRET", () => {
    vi.stubEnv("SESSION_SECRET", "short");
    expect(() => sessionSecret()).toThrow(/at least 32 characters/);
  });

  it("outside production generates one into the data folder once (mode 600) and reuses it", () => {
    const folder = mkdtempSync(path.join(tmpdir(), "comova-secret-"));
    try {
      vi.stubEnv("SESSION_SECRET", "");
      vi.stubEnv("NODE_ENV", "development");
      vi.stubEnv("DATABASE_URL", `file:${path.join(folder, "c.db")}`);
      const first = sessionSecret();
      const file = path.join(folder, "session-secret");
      expect(existsSync(file)).toBe(true);
      expect(readFileSync(file, "utf8")).toBe(first);
      expect(statSync(file).mode & 0o777).toBe(0o600);
      expect(first.length).toBeGreaterThanOrEqual(32);
      expect(sessionSecret()).toBe(first);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
