// Profiles against a real (temporary) database: immutable versions, pinning, team isolation, hashes.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const folder = mkdtempSync(path.join(tmpdir(), "comova-profiles-"));
process.env.DATABASE_URL = `file:${path.join(folder, "profiles.db")}`;

const { migrateDatabase } = await import("@/db/migrate");
const { db, rawClient, write } = await import("@/db/client");
const { profiles, teams } = await import("@/db/schema");
const profilesModule = await import("@/api-core/profiles");
const { createProfile, ensureProfile, findCosmology, listCosmologies, resolveCosmology, cosmologyVersions } = profilesModule;

const TEAM = "team_a";
const OTHER = "team_b";
const count = async () => (await db().select().from(profiles)).length;

beforeAll(async () => {
  await migrateDatabase();
  await write((d) => d.insert(teams).values([{ id: TEAM, slug: "team-a", name: "A", createdAt: 0 }, { id: OTHER, slug: "team-b", name: "B", createdAt: 0 }]));
});
afterAll(() => {
  rawClient().close();
  rmSync(folder, { recursive: true, force: true });
});

describe("team profiles", () => {
  it("a slug saved twice has versions 1 and 2; slug is the latest, slug@1 stays what it was", async () => {
    const v1 = await createProfile(TEAM, { slug: "fiducial", title: "One", parameters: { h0: 70, omegaM: 0.3 } }, null);
    const v2 = await createProfile(TEAM, { slug: "fiducial", title: "Two", parameters: { h0: 68, omegaM: 0.31 } }, null);
    expect([v1.version, v2.version]).toEqual([1, 2]);
    expect((await findCosmology("fiducial", TEAM)).ref).toBe("fiducial@2");
    expect(await findCosmology("fiducial@1", TEAM)).toEqual(v1);
    expect((await cosmologyVersions("fiducial", TEAM)).map((v) => v.title)).toEqual(["One", "Two"]);
    expect((await listCosmologies(TEAM)).filter((c) => c.kind === "profile").map((c) => c.ref)).toEqual(["fiducial@2"]);
  });

  it("another team (or no team) cannot see it: 404", async () => {
    await expect(findCosmology("fiducial", OTHER)).rejects.toMatchObject({ status: 404 });
    await expect(findCosmology("fiducial", null)).rejects.toMatchObject({ status: 404 });
    expect((await listCosmologies(OTHER)).every((c) => c.kind === "preset")).toBe(true);
    await expect(findCosmology("fiducial@9", TEAM)).rejects.toMatchObject({ status: 404, detail: expect.stringContaining("versions are 1, 2") });
  });

  it("same parameters give the same hash, inline or through the profile (defaults filled in first)", async () => {
    const viaProfile = await resolveCosmology({ cosmology: "fiducial@1" }, TEAM);
    const inline = await resolveCosmology({ h0: 70, omegaM: 0.3, tcmb: 2.7255, w0: -1 }, TEAM);
    expect(inline.hash).toBe(viaProfile.hash);
    expect(inline.ref).toBeNull();
    expect(viaProfile.ref).toBe("fiducial@1");
  });

  it("presets are public, version 1 only, and their slugs cannot be taken (409); nothing is written", async () => {
    const before = await count();
    expect((await findCosmology("planck18", null)).ref).toBe("planck18@1");
    await expect(findCosmology("planck18@2", null)).rejects.toMatchObject({ status: 404 });
    await expect(createProfile(TEAM, { slug: "planck18", title: "Mine", parameters: { h0: 70, omegaM: 0.3 } }, null)).rejects.toMatchObject({ status: 409 });
    // Ωm = 0, ΩΛ = 2: E(z)² = 2 − (1+z)² turns negative at z = √2 − 1: no big bang, refused before writing.
    await expect(createProfile(TEAM, { slug: "bounce", title: "Bounce", parameters: { h0: 70, omegaM: 0, omegaDE: 2, tcmb: 0 } }, null)).rejects.toHaveProperty("parameter");
    expect(await count()).toBe(before);
  });

  it("ensureProfile (the demo seed) is idempotent", async () => {
    await ensureProfile(OTHER, { slug: "seeded", title: "Seeded", parameters: { h0: 70, omegaM: 0.3 } });
    await ensureProfile(OTHER, { slug: "seeded", title: "Seeded", parameters: { h0: 70, omegaM: 0.3 } });
    expect((await cosmologyVersions("seeded", OTHER)).length).toBe(1);
  });

  it("concurrent saves of one slug get distinct consecutive versions", async () => {
    const saved = await Promise.all(Array.from({ length: 5 }, (_, i) => createProfile(TEAM, { slug: "burst", title: `v${i}`, parameters: { h0: 60 + i, omegaM: 0.3 } }, null)));
    expect(saved.map((v) => v.version).sort()).toEqual([1, 2, 3, 4, 5]);
  });
});
