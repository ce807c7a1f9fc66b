import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import { userFromSessionToken } from "@/api-core/access/authorize";
import { API_COOKIE, CONSOLE_COOKIE, SESSION_HOURS, signSession } from "@/api-core/access/session";
import { reachOf, type Permission } from "@/api-core/access/permissions";
import type { SessionUser } from "@/api-core/access/types";

/** The signed-in user of a console page, or a redirect to the sign-in page. */
export async function requireUser(): Promise<SessionUser> {
  const user = await userFromSessionToken((await cookies()).get(CONSOLE_COOKIE)?.value);
  if (!user) redirect("/console/sign-in");
  return user;
}

/** Sets (user) or clears (null) both session cookies: Lax for the console, Strict for the admin API. */
export async function setSessionCookies(user: SessionUser | null): Promise<void> {
  const jar = await cookies();
  const secure = (await headers()).get("x-forwarded-proto") === "https";
  const token = user ? await signSession(user.id) : "";
  const maxAge = user ? SESSION_HOURS * 3600 : 0;
  jar.set(CONSOLE_COOKIE, token, { httpOnly: true, sameSite: "lax", path: "/console", secure, maxAge });
  jar.set(API_COOKIE, token, { httpOnly: true, sameSite: "strict", path: "/api/v1/admin", secure, maxAge });
}

/**
 * The signed-in user of a page that needs a permission. A role without it is sent to the keys page,
 * which says why; the admin routes behind the page refuse it too.
 */
export async function requirePermission(permission: Permission): Promise<SessionUser> {
  const user = await requireUser();
  if (!reachOf(user.role, permission)) redirect(`/console?refused=${encodeURIComponent(permission)}`);
  return user;
}
