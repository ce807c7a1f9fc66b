import { write } from "@/db/client";
import { apiKeys } from "@/db/schema";
import { deriveKey, hashKey, visiblePrefix } from "./key-format";
import { sessionSecret } from "./session";
import { DEFAULT_MONTHLY_UNITS, DEFAULT_PER_MINUTE } from "./types";

export const DEMO_KEY_ID = "key_demo_member";

/**
 * The demo member's API key. Its secret is derived from the installation's session secret, so the
 * start script can print the same working key on every start without storing it or fixing it in code.
 */
export function demoKeySecret(): string {
  return deriveKey(sessionSecret(), "comova demo api key");
}

/** Creates the demo key, or re-points it at the current secret; idempotent. Returns the secret. */
export async function ensureDemoKey(owner: { teamId: string; userId: string }): Promise<string> {
  const secret = demoKeySecret();
  const credentials = { prefix: visiblePrefix(secret), secretHash: hashKey(secret) };
  await write((d) =>
    d
      .insert(apiKeys)
      .values({
        id: DEMO_KEY_ID,
        ...owner,
        name: "Demo key",
        ...credentials,
        scopes: ["compute", "profiles:write"],
        monthlyUnits: DEFAULT_MONTHLY_UNITS,
        perMinute: DEFAULT_PER_MINUTE,
        createdAt: Date.now(),
      })
      .onConflictDoUpdate({ target: apiKeys.id, set: credentials }),
  );
  return secret;
}
