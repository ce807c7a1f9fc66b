import { ProblemError } from "@/api-core/http/problem";
import { PERMISSIONS, reachOf, visibilityFor, type Permission, type Visibility } from "./permissions";
import { findSessionUser } from "./reads";
import { verifySession } from "./session";
import type { SessionUser } from "./types";

/** The signed-in user of a session token, or null (missing, tampered, expired, foreign, disabled). */
export async function userFromSessionToken(token: string | null | undefined): Promise<SessionUser | null> {
  if (!token) return null;
  const userId = await verifySession(token);
  return userId ? findSessionUser(userId) : null;
}

/** The rows `user` may see under `permission`; 403 when the role has no such permission (OWASP API5). */
export function authorize(user: SessionUser, permission: Permission): Visibility {
  const reach = reachOf(user.role, permission);
  if (!reach) {
    const allowed = Object.keys(PERMISSIONS[permission]).join(", ");
    throw new ProblemError(403, "forbidden", `Your role (${user.role}) does not allow ${permission}; it needs one of: ${allowed}. Ask an administrator if you need it.`);
  }
  return visibilityFor(user, reach);
}
