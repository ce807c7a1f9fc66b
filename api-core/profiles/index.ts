// Cosmology selection: a public preset or a team profile, by `slug` (latest) or `slug@version`.
// Profiles are immutable: saving a slug again adds version n+1; nothing is ever edited.
import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, max } from "drizzle-orm";
import {
  PRESETS,
  createCosmology,
  parameterHash,
  resolveParameters,
  type Cosmology,
  type CosmologyInput,
  type CosmologyParameters,
} from "@/api-core/cosmology";
import { auditInsert, type AuditEvent } from "@/api-core/audit/audit-trail";
import { ProblemError } from "@/api-core/http/problem";
import { db, write } from "@/db/client";
import { profiles } from "@/db/schema";

/** One immutable version of a preset or a team profile. */
export interface CosmologyVersion {
  kind: "preset" | "profile";
  slug: string;
  version: number;
  ref: string;
  title: string;
  description: string | null;
  hash: string;
  parameters: CosmologyParameters;
  createdAt: string | null;
}

/** The cosmology that answers a call: what the envelope reports, and the model that computes. */
export interface ResolvedCosmology {
  ref: string | null;
  hash: string;
  parameters: CosmologyParameters;
  model: Cosmology;
}

export type CosmologySelection = { cosmology?: string } & Partial<CosmologyInput>;

function presetVersion(slug: string): CosmologyVersion | null {
  const preset = Object.hasOwn(PRESETS, slug) ? PRESETS[slug] : null;
  if (!preset) return null;
  return {
    kind: "preset",
    slug,
    version: preset.version,
    ref: `${slug}@${preset.version}`,
    title: preset.title,
    description: preset.source,
    hash: parameterHash(preset.parameters),
    parameters: preset.parameters,
    createdAt: null,
  };
}

function profileVersion(row: typeof profiles.$inferSelect): CosmologyVersion {
  return {
    kind: "profile",
    slug: row.slug,
    version: row.version,
    ref: `${row.slug}@${row.version}`,
    title: row.title,
    description: row.description,
    hash: row.hash,
    parameters: row.parameters as CosmologyParameters,
    createdAt: new Date(row.createdAt).toISOString(),
  };
}

function notFound(slug: string, teamId: string | null): ProblemError {
  const presets = Object.keys(PRESETS).join(", ");
  const scope = teamId ? "your team has no profile of that name" : "team profiles need an API key of the team";
  return new ProblemError(404, "unknown-cosmology", `No cosmology named ${slug}: it is not a preset (${presets}) and ${scope}. GET /api/v1/cosmologies lists what you can use.`);
}

/** Every version of a preset or of the team's profile, oldest first; 404 when the caller cannot see it. */
export async function cosmologyVersions(slug: string, teamId: string | null): Promise<CosmologyVersion[]> {
  const preset = presetVersion(slug);
  if (preset) return [preset];
  if (teamId) {
    const rows = await db().select().from(profiles).where(and(eq(profiles.teamId, teamId), eq(profiles.slug, slug))).orderBy(asc(profiles.version));
    if (rows.length) return rows.map(profileVersion);
  }
  throw notFound(slug, teamId);
}

/** Presets, then the latest version of each of the team's profiles. */
export async function listCosmologies(teamId: string | null): Promise<CosmologyVersion[]> {
  const presets = Object.keys(PRESETS).map((slug) => presetVersion(slug)!);
  if (!teamId) return presets;
  const rows = await db().select().from(profiles).where(eq(profiles.teamId, teamId)).orderBy(asc(profiles.slug), desc(profiles.version));
  const latest = rows.filter((row, i) => i === 0 || rows[i - 1].slug !== row.slug);
  return [...presets, ...latest.map(profileVersion)];
}

/** `slug` → latest version, `slug@version` → that version. */
export async function findCosmology(ref: string, teamId: string | null): Promise<CosmologyVersion> {
  const [slug, pinned] = ref.split("@");
  const versions = await cosmologyVersions(slug, teamId);
  if (pinned === undefined) return versions[versions.length - 1];
  const found = versions.find((v) => v.version === Number(pinned));
  if (!found) {
    throw new ProblemError(404, "unknown-cosmology-version", `${slug} has no version ${pinned}; its versions are ${versions.map((v) => v.version).join(", ")}.`);
  }
  return found;
}

// Building a model can tabulate integrals; keep the most recently used ones.
const models = new Map<string, Cosmology>();
const MODEL_CACHE_SIZE = 32;

function modelFor(hash: string, parameters: CosmologyParameters): Cosmology {
  let model = models.get(hash);
  if (model) {
    models.delete(hash);
  } else {
    model = createCosmology(parameters);
    if (models.size >= MODEL_CACHE_SIZE) models.delete(models.keys().next().value!);
  }
  models.set(hash, model);
  return model;
}

const INLINE_FIELDS = ["h0", "omegaM", "omegaDE", "tcmb", "nEff", "neutrinoMasses", "w0", "wa"] as const;

/** The named or inline cosmology of a validated request (the schema has checked that exactly one way was used). */
export async function resolveCosmology(selection: CosmologySelection, teamId: string | null): Promise<ResolvedCosmology> {
  if (selection.cosmology !== undefined) {
    const found = await findCosmology(selection.cosmology, teamId);
    return { ref: found.ref, hash: found.hash, parameters: found.parameters, model: modelFor(found.hash, found.parameters) };
  }
  const input = Object.fromEntries(INLINE_FIELDS.filter((f) => selection[f] !== undefined).map((f) => [f, selection[f]])) as unknown as CosmologyInput;
  const parameters = resolveParameters(input);
  const hash = parameterHash(parameters);
  return { ref: null, hash, parameters, model: modelFor(hash, parameters) };
}

export interface NewProfile {
  slug: string;
  title: string;
  description?: string;
  parameters: CosmologyInput;
}

function isUniqueViolation(error: unknown): boolean {
  return /UNIQUE constraint failed/i.test(String((error as Error)?.message) + String((error as { cause?: Error })?.cause?.message ?? ""));
}

/**
 * Saves version n+1 of the team's profile `slug` (version 1 when new). The parameters are resolved and
 * the model built first, so a profile with no big bang is refused (422) before anything is written.
 */
export async function createProfile(teamId: string, input: NewProfile, actor: AuditEvent["actor"]): Promise<CosmologyVersion> {
  if (Object.hasOwn(PRESETS, input.slug)) {
    throw new ProblemError(409, "slug-taken", `${input.slug} is the name of a preset; choose another slug for your team's profile.`);
  }
  const parameters = resolveParameters(input.parameters);
  modelFor(parameterHash(parameters), parameters);
  return saveVersion(teamId, input, parameters, actor);
}

/** Inserts the version and, when someone made it, its audit-trail entry in the same atomic batch. */
async function saveVersion(teamId: string, input: NewProfile, parameters: CosmologyParameters, actor: AuditEvent["actor"]): Promise<CosmologyVersion> {
  // Within a process the write queue orders versions; across processes the unique index does, so retry.
  for (let attempt = 0; ; attempt++) {
    try {
      const row = await write(async (d) => {
        const latest = await d.select({ version: max(profiles.version) }).from(profiles).where(and(eq(profiles.teamId, teamId), eq(profiles.slug, input.slug))).get();
        const values = {
          id: `prof_${randomUUID()}`,
          teamId,
          slug: input.slug,
          version: (latest?.version ?? 0) + 1,
          title: input.title,
          description: input.description ?? null,
          parameters,
          hash: parameterHash(parameters),
          createdBy: actor?.id ?? null,
          createdAt: Date.now(),
        };
        const insert = d.insert(profiles).values(values);
        if (actor) {
          const detail = { slug: values.slug, version: values.version, hash: values.hash };
          await d.batch([insert, auditInsert({ actor, teamId, action: "profile.created", targetType: "profile", targetId: values.id, detail }, d)]);
        } else await insert;
        return values;
      });
      return profileVersion(row);
    } catch (error) {
      if (!isUniqueViolation(error) || attempt >= 4) throw error;
    }
  }
}

/** Version 1 of a profile unless the team already has that slug (the idempotent demo seed; its parameters are known good). */
export async function ensureProfile(teamId: string, input: NewProfile): Promise<void> {
  const existing = await db().select({ id: profiles.id }).from(profiles).where(and(eq(profiles.teamId, teamId), eq(profiles.slug, input.slug))).get();
  if (!existing) await saveVersion(teamId, input, resolveParameters(input.parameters), null);
}
