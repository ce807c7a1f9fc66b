import { eq } from "drizzle-orm";
import { ensureDemoKey } from "@/api-core/access/demo-key";
import { hashPassword } from "@/api-core/access/password";
import { ensureProfile } from "@/api-core/profiles";
import { db, write } from "./client";
import { teams, users, type Role } from "./schema";

/**
 * The demo scenario (fictional): the Lantern Ridge Redshift Survey, a small team reducing
 * spectroscopic redshifts of its galaxy fields. Fixed ids make the seed idempotent.
 */
export const DEMO_TEAM = { id: "team_lantern_ridge", slug: "lantern-ridge", name: "Lantern Ridge Redshift Survey" };

export const DEMO_PASSWORD = "starlight-demo";

export const DEMO_USERS: { id: string; email: string; name: string; role: Role; teamId: string | null }[] = [
  { id: "user_demo_admin", email: "admin@lantern-ridge.example", name: "Mira Castellane", role: "administrator", teamId: null },
  { id: "user_demo_manager", email: "oduya@lantern-ridge.example", name: "Kwame Oduya", role: "manager", teamId: DEMO_TEAM.id },
  { id: "user_demo_member", email: "lindqvist@lantern-ridge.example", name: "Signe Lindqvist", role: "member", teamId: DEMO_TEAM.id },
  { id: "user_demo_auditor", email: "ferro@lantern-ridge.example", name: "Tomas Ferro", role: "auditor", teamId: DEMO_TEAM.id },
];

/** The team's own cosmology profile (fictional fiducial values), visible only to Lantern Ridge keys. */
export const DEMO_PROFILE = {
  slug: "lantern-fiducial",
  title: "Lantern Ridge fiducial cosmology",
  description: "Flat ΛCDM with round numbers, fixed for the survey's first data release.",
  parameters: { h0: 68, omegaM: 0.31 },
};

export async function seedDemo(): Promise<void> {
  const now = Date.now();
  await write((d) => d.insert(teams).values({ ...DEMO_TEAM, createdAt: now }).onConflictDoNothing());
  for (const user of DEMO_USERS) {
    const existing = await db().select({ id: users.id }).from(users).where(eq(users.email, user.email)).get();
    if (existing) continue;
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    await write((d) => d.insert(users).values({ ...user, passwordHash, createdAt: now }).onConflictDoNothing());
  }
  await ensureDemoKey({ teamId: DEMO_TEAM.id, userId: "user_demo_member" });
  await ensureProfile(DEMO_TEAM.id, DEMO_PROFILE);
}
