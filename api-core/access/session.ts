import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { jwtVerify, SignJWT } from "jose";
import { databaseUrl } from "@/db/client";

/**
 * Sessions: an HS256 JWT (jose) naming the user, in httpOnly cookies. The console pages get a
 * SameSite=Lax cookie (so a link from an e-mail arrives signed in); the admin API gets the same token
 * in a SameSite=Strict cookie, so no other site can make a browser send it to the API.
 * The role is read from the database on every request, so a role change applies at once.
 */
export const CONSOLE_COOKIE = "comova_session";
export const API_COOKIE = "comova_api_session";
export const SESSION_HOURS = 8;
const ISSUER = "comova";
const AUDIENCE = "comova-console";
const MIN_SECRET_LENGTH = 32;

export class MissingSessionSecretError extends Error {}

/** Where a generated secret lives: next to a `file:` database, else ./data. */
function secretFile(): string {
  const url = databaseUrl();
  const folder = url.startsWith("file:") ? path.dirname(path.resolve(url.slice(5).split("?")[0])) : path.resolve("data");
  return path.join(folder, "session-secret");
}

function readOrCreateSecret(file: string): string {
  mkdirSync(path.dirname(file), { recursive: true });
  try {
    // "wx": only one process creates it; the others read what it wrote.
    writeFileSync(file, randomBytes(32).toString("base64url"), { flag: "wx", mode: 0o600 });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
  }
  return readFileSync(file, "utf8").trim();
}

let cached: { url: string; secret: string } | undefined;

/**
 * SESSION_SECRET, or outside production a secret generated once into the data folder and reused.
 * In production a missing secret is an error: generated secrets would differ between instances.
 */
export function sessionSecret(): string {
  const fromEnvironment = process.env.SESSION_SECRET;
  if (fromEnvironment) {
    if (fromEnvironment.length < MIN_SECRET_LENGTH) {
      throw new MissingSessionSecretError(`SESSION_SECRET must be at least ${MIN_SECRET_LENGTH} characters (e.g. \`openssl rand -base64 32\`).`);
    }
    return fromEnvironment;
  }
  if (process.env.NODE_ENV === "production") {
    throw new MissingSessionSecretError(
      "SESSION_SECRET is not set. In production Comova needs it to sign console sessions, the same value on every instance: set it to a random string of at least 32 characters (e.g. `openssl rand -base64 32`).",
    );
  }
  const url = databaseUrl();
  if (cached?.url !== url) cached = { url, secret: readOrCreateSecret(secretFile()) };
  return cached.secret;
}

function signingKey(): Uint8Array {
  return new TextEncoder().encode(sessionSecret());
}

export async function signSession(userId: string, now = Date.now()): Promise<string> {
  const issuedAt = Math.floor(now / 1000);
  return new SignJWT({})
    .setProtectedHeader({ alg: "HS256" })
    .setSubject(userId)
    .setIssuer(ISSUER)
    .setAudience(AUDIENCE)
    .setIssuedAt(issuedAt)
    .setExpirationTime(issuedAt + SESSION_HOURS * 3600)
    .sign(signingKey());
}

/** The user id of a valid session token; null for a tampered, expired or foreign-signed one. */
export async function verifySession(token: string): Promise<string | null> {
  try {
    // Only HS256 is accepted: an `alg: none` or asymmetric token is refused before any signature check.
    const { payload } = await jwtVerify(token, signingKey(), { algorithms: ["HS256"], issuer: ISSUER, audience: AUDIENCE });
    return payload.sub ?? null;
  } catch {
    return null;
  }
}

/** Set-Cookie values for a new session, or (token null) for signing out. */
export function sessionCookies(token: string | null, secure: boolean): string[] {
  const maxAge = token ? SESSION_HOURS * 3600 : 0;
  const common = `HttpOnly; Max-Age=${maxAge}${secure ? "; Secure" : ""}`;
  return [
    `${CONSOLE_COOKIE}=${token ?? ""}; Path=/console; SameSite=Lax; ${common}`,
    `${API_COOKIE}=${token ?? ""}; Path=/api/v1/admin; SameSite=Strict; ${common}`,
  ];
}

/** The value of one cookie in a Cookie header. */
export function readCookie(header: string | null, name: string): string | null {
  for (const part of (header ?? "").split(";")) {
    const [key, ...value] = part.trim().split("=");
    if (key === name) return value.join("=") || null;
  }
  return null;
}
