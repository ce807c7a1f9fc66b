import { parseKey } from "@/api-core/access/key-format";
import { findKeyByHash, keyStatus } from "@/api-core/access/reads";
import { ProblemError } from "./problem";

/** The calling key, as the guard and the routes see it. Never holds the secret. */
export interface AuthenticatedKey {
  id: string;
  teamId: string;
  userId: string | null;
  prefix: string;
  scopes: string[];
  monthlyUnits: number;
  perMinute: number;
  revokedAt: number | null;
  expiresAt: number | null;
}

/** 401 with the RFC 6750 challenge; no error code when no credentials were sent at all (§3.1). */
function unauthorized(detail: string, sent: boolean): ProblemError {
  const challenge = sent ? `Bearer realm="comova", error="invalid_token"` : `Bearer realm="comova"`;
  return new ProblemError(401, "invalid-key", detail, {}, { "WWW-Authenticate": challenge });
}

/**
 * Step 1 of the guard: which key `Authorization: Bearer …` names. Shape and checksum are checked
 * first, so a malformed or mistyped key is refused without a database read; `lookup` is a parameter
 * so a test can prove it. The key found may still be revoked or expired: see {@link requireActive}.
 */
export async function identifyKey(request: Request, lookup = findKeyByHash): Promise<AuthenticatedKey> {
  const header = request.headers.get("authorization");
  if (!header) throw unauthorized("This endpoint needs an API key: send `Authorization: Bearer cmv_…`. Keys are issued in the console at /console.", false);
  const match = /^Bearer +(\S+)$/i.exec(header.trim());
  if (!match) throw unauthorized("The Authorization header must read `Bearer <key>` with a Comova key (cmv_…).", true);
  const parsed = parseKey(match[1]);
  if (!parsed.ok) throw unauthorized(parsed.reason, true);
  const row = await lookup(parsed.hash);
  if (!row) throw unauthorized(`Key ${parsed.prefix}… is not known to this Comova installation; check that you use the right key and server.`, true);
  const { id, teamId, userId, prefix, scopes, monthlyUnits, perMinute, revokedAt, expiresAt } = row;
  return { id, teamId, userId, prefix, scopes, monthlyUnits, perMinute, revokedAt, expiresAt };
}

/** Step 2: a revoked or expired key is refused (401); the call is still logged against it. */
export function requireActive(key: AuthenticatedKey): void {
  const status = keyStatus(key);
  if (status !== "active") throw unauthorized(`Key ${key.prefix}… is ${status}; issue a new one in the console at /console.`, true);
}

/** Step 3: the key must carry the route's scope (403, OWASP API5). */
export function requireScope(key: AuthenticatedKey, scope: string): void {
  if (!key.scopes.includes(scope)) {
    throw new ProblemError(403, "insufficient-scope", `Key ${key.prefix}… lacks the scope "${scope}" this endpoint needs (it has: ${key.scopes.join(", ") || "none"}). Issue a key with that scope.`, {}, {
      "WWW-Authenticate": `Bearer realm="comova", error="insufficient_scope", scope="${scope}"`,
    });
  }
}
