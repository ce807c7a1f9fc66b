// Helpers of the access HTTP tests: demo users' sessions, a direct database handle on the test server's file.
import { createClient } from "@libsql/client";
import { inject } from "vitest";
import { api } from "../http/support";

export const DEMO_PASSWORD = "starlight-demo";
export const DEMO = {
  administrator: "admin@lantern-ridge.example",
  manager: "oduya@lantern-ridge.example",
  member: "lindqvist@lantern-ridge.example",
  auditor: "ferro@lantern-ridge.example",
} as const;
export const DEMO_TEAM_ID = "team_lantern_ridge";

/** Cookie header of a fresh session (POST /api/v1/admin/session). */
export async function signIn(email: string, password = DEMO_PASSWORD): Promise<string> {
  const response = await api().post("/api/v1/admin/session").set("X-Forwarded-For", "198.51.100.1").send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in of ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  const cookie = (response.headers["set-cookie"] as unknown as string[]).find((c) => c.startsWith("comova_api_session="))!;
  return cookie.split(";")[0];
}

const sessions = new Map<string, Promise<string>>();
/** A session per demo role, signed in once per test file. */
export function session(role: keyof typeof DEMO): Promise<string> {
  if (!sessions.has(role)) sessions.set(role, signIn(DEMO[role]));
  return sessions.get(role)!;
}

/** Reads the test server's database directly (to check what was stored, or to age an invitation). */
export function database() {
  return createClient({ url: inject("databaseUrl") });
}

export const unique = (label: string) => `${label}-${Math.random().toString(36).slice(2, 8)}`;
