import { authorize, userFromSessionToken } from "@/api-core/access/authorize";
import type { Permission, Visibility } from "@/api-core/access/permissions";
import { API_COOKIE, readCookie, sessionCookies, signSession } from "@/api-core/access/session";
import type { SessionUser } from "@/api-core/access/types";
import { isHttps } from "./admin-input";
import { withProblems } from "./guard";
import { ProblemError } from "./problem";

export interface SessionContext<Params> {
  request: Request;
  url: URL;
  params: Params;
  user: SessionUser;
  /** The rows this user may see under the route's permission. */
  visibility: Visibility;
}

/** Step 1 of the admin guard: the session cookie of the admin API (SameSite=Strict). */
export async function authenticateSession(request: Request): Promise<SessionUser> {
  const user = await userFromSessionToken(readCookie(request.headers.get("cookie"), API_COOKIE));
  if (!user) {
    throw new ProblemError(401, "not-signed-in", "Sign in first: POST /api/v1/admin/session with your e-mail and password, or use /console/sign-in.", {}, {
      "WWW-Authenticate": `Cookie realm="comova", form-action="/console/sign-in", cookie-name="${API_COOKIE}"`,
    });
  }
  return user;
}

/**
 * The guard of every admin route: session → permission (the one table in api-core/access) → handler.
 * `permission: null` only needs a signed-in user.
 */
export function withSession<Params = Record<string, never>>(
  handler: (context: SessionContext<Params>) => Promise<Response>,
  options: { permission: Permission | null },
) {
  return withProblems<Params>(async (request, params) => {
    const user = await authenticateSession(request);
    const visibility = options.permission ? authorize(user, options.permission) : {};
    return handler({ request, url: new URL(request.url), params, user, visibility });
  });
}

/** An answer that starts a session (token null: ends it), setting both session cookies. */
export async function sessionResponse(request: Request, user: SessionUser | null): Promise<Response> {
  const headers = new Headers({ "cache-control": "no-store" });
  for (const cookie of sessionCookies(user ? await signSession(user.id) : null, isHttps(request))) headers.append("set-cookie", cookie);
  return user ? Response.json({ user }, { headers }) : new Response(null, { status: 204, headers });
}
