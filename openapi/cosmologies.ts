// Schemas of /api/v1/cosmologies: presets and team profiles (immutable versions).
import { inlineCosmologyShape } from "./common";
import { problemResponses, BEARER } from "./responses";
import { registry } from "./registry";
import { z } from "./zod";

const { h0, omegaM, ...optionalParameters } = inlineCosmologyShape;

export const ProfileInput = z
  .strictObject({
    slug: z
      .string()
      .regex(/^[a-z][a-z0-9-]{1,62}$/, "a slug is 2–63 characters: lower-case letters, digits and hyphens, starting with a letter")
      .openapi({ description: "Name of the profile within your team. Saving an existing slug adds a new version.", example: "lantern-fiducial" }),
    title: z.string().trim().min(1, "give the profile a title").max(200).openapi({ example: "Lantern Ridge fiducial cosmology" }),
    description: z.string().max(2000).optional().openapi({ example: "Flat ΛCDM used for the 2026 data release." }),
    parameters: z
      .strictObject({ h0, omegaM, ...Object.fromEntries(Object.entries(optionalParameters).map(([k, v]) => [k, v.optional()])) as { [K in keyof typeof optionalParameters]: z.ZodOptional<(typeof optionalParameters)[K]> } })
      .openapi({ description: "The cosmology, with the inline names of the compute endpoints; defaults are filled in and stored.", example: { h0: 67.7, omegaM: 0.31 } }),
  })
  .openapi("ProfileInput");

export const CosmologyVersionSchema = z
  .object({
    kind: z.enum(["preset", "profile"]),
    slug: z.string(),
    version: z.number().int(),
    ref: z.string().openapi({ description: "slug@version: pins exactly this version.", example: "planck18@1" }),
    title: z.string(),
    description: z.string().nullable().openapi({ description: "For a preset, its published source." }),
    hash: z.string().openapi({ example: "sha256:…" }),
    parameters: z.object({
      h0: z.number(),
      omegaM: z.number(),
      omegaDE: z.number().nullable(),
      tcmb: z.number(),
      nEff: z.number(),
      neutrinoMasses: z.array(z.number()),
      w0: z.number(),
      wa: z.number(),
    }),
    createdAt: z.string().nullable().openapi({ description: "ISO 8601; null for presets." }),
  })
  .openapi("CosmologyVersion");

export const CosmologyList = z.object({ cosmologies: z.array(CosmologyVersionSchema).openapi({ description: "Presets, then the latest version of each of your team's profiles." }) }).openapi("CosmologyList");

export const CosmologyDetail = z
  .object({ slug: z.string(), latest: z.string().openapi({ example: "planck18@1" }), versions: z.array(CosmologyVersionSchema).openapi({ description: "Every version, oldest first." }) })
  .openapi("CosmologyDetail");

export const SlugParams = z.object({ slug: z.string().openapi({ description: "Preset or profile slug.", example: "planck18" }) });

registry.registerPath({
  method: "get",
  path: "/api/v1/cosmologies",
  operationId: "listCosmologies",
  tags: ["cosmologies"],
  summary: "List presets and your team's profiles",
  security: [{ [BEARER]: [] }],
  responses: { "200": { description: "Presets (public) and your team's profiles (latest versions).", content: { "application/json": { schema: CosmologyList } } }, ...problemResponses([401, 403, 429]) },
});
registry.registerPath({
  method: "post",
  path: "/api/v1/cosmologies",
  operationId: "createProfile",
  tags: ["cosmologies"],
  summary: "Save a team profile (a new immutable version)",
  description: "Needs a key with the profiles:write scope. A new slug starts at version 1; an existing slug gets version n+1; earlier versions never change, so `slug@n` stays reproducible.",
  security: [{ [BEARER]: [] }],
  request: { body: { required: true, content: { "application/json": { schema: ProfileInput, example: { slug: "lantern-fiducial", title: "Lantern Ridge fiducial cosmology", parameters: { h0: 67.7, omegaM: 0.31 } } } } } },
  responses: { "201": { description: "The saved version.", content: { "application/json": { schema: CosmologyVersionSchema } } }, ...problemResponses([400, 401, 403, 409, 413, 415, 422, 429]) },
});
registry.registerPath({
  method: "get",
  path: "/api/v1/cosmologies/{slug}",
  operationId: "getCosmology",
  tags: ["cosmologies"],
  summary: "One preset or profile with all its versions",
  security: [{ [BEARER]: [] }],
  request: { params: SlugParams },
  responses: { "200": { description: "Every version, oldest first.", content: { "application/json": { schema: CosmologyDetail } } }, ...problemResponses([401, 403, 404, 429]) },
});
