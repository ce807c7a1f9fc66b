// Building blocks shared by every compute endpoint: the cosmology selection, units, redshift lists,
// the answer envelope and the problem+json body.
import { DISTANCE_UNITS, PARAMETER_LIMITS, TIME_UNITS } from "@/api-core/cosmology";
import { LIMITS } from "./limits";
import { z } from "./zod";

/** A GET query carries a list as one comma-separated value (`z=0.1,0.5,1`): OpenAPI form style, not exploded. */
const commaList = { style: "form", explode: false } as const;

function bounded(name: keyof typeof PARAMETER_LIMITS, description: string, example: number) {
  const { min, max } = PARAMETER_LIMITS[name];
  return z.number().min(min).max(max).openapi({ description, example });
}

export const REF_PATTERN = /^[a-z][a-z0-9-]{1,62}(@[1-9][0-9]{0,8})?$/;

/** Fields of an inline cosmology, in DESIGN §3 order; every one optional here, checked by {@link checkCosmologySelection}. */
export const inlineCosmologyShape = {
  h0: bounded("h0", "Hubble constant today, km/s/Mpc (inline cosmology; required with omegaM).", 70),
  omegaM: bounded("omegaM", "Non-relativistic matter density today including massive neutrinos, in units of the critical density (inline cosmology; required with h0).", 0.3),
  omegaDE: bounded("omegaDE", "Dark-energy density today. Absent: the universe is flat (omegaDE = 1 − every other density).", 0.7),
  tcmb: bounded("tcmb", "CMB temperature today, K. Default 2.7255; 0 switches photons and neutrinos off.", 2.7255),
  nEff: bounded("nEff", "Effective number of neutrino species, shared by 3 species. Default 3.046.", 3.046),
  neutrinoMasses: z
    .array(bounded("neutrinoMass", "Mass of one neutrino species, eV.", 0.06))
    .max(3)
    .openapi({ description: "Masses of the massive neutrino species, eV (at most 3; the rest are massless). Default none.", example: [0.06], param: commaList }),
  w0: bounded("w0", "Dark-energy equation of state today, w(a) = w0 + wa (1 − a). Default −1.", -1),
  wa: bounded("wa", "Evolution of the dark-energy equation of state, w(a) = w0 + wa (1 − a). Default 0.", 0),
};

export const INLINE_COSMOLOGY_FIELDS = Object.keys(inlineCosmologyShape) as (keyof typeof inlineCosmologyShape)[];

export const cosmologySelectionShape = {
  cosmology: z
    .string()
    .regex(REF_PATTERN, "a cosmology is named slug or slug@version, e.g. planck18 or planck18@1")
    .optional()
    .openapi({ description: "A preset (planck18, planck15, wmap9, textbook) or a profile of your team, as slug (latest version) or slug@version. Give this or inline parameters, not both.", example: "planck18" }),
  ...Object.fromEntries(Object.entries(inlineCosmologyShape).map(([k, v]) => [k, v.optional()])) as {
    [K in keyof typeof inlineCosmologyShape]: z.ZodOptional<(typeof inlineCosmologyShape)[K]>;
  },
};

export const unitShape = {
  distanceUnit: z.enum(DISTANCE_UNITS).optional().openapi({ description: "Unit of every distance in the answer (volumes in its cube). Mpc/h uses the h of the selected cosmology. Default Mpc.", example: "Mpc" }),
  timeUnit: z.enum(TIME_UNITS).optional().openapi({ description: "Unit of every time in the answer (Julian years). Default Gyr.", example: "Gyr" }),
};

type SelectionValue = { cosmology?: string } & Partial<Record<(typeof INLINE_COSMOLOGY_FIELDS)[number], unknown>>;

/** Exactly one way of choosing the cosmology: a named one, or inline parameters with at least h0 and omegaM. */
export function checkCosmologySelection(value: SelectionValue, ctx: z.RefinementCtx): void {
  const inline = INLINE_COSMOLOGY_FIELDS.filter((field) => value[field] !== undefined);
  if (value.cosmology !== undefined) {
    if (inline.length > 0) {
      ctx.addIssue({
        code: "custom",
        path: ["cosmology"],
        message: `give either cosmology=${value.cosmology} or inline parameters, not both (also given: ${inline.join(", ")})`,
      });
    }
    return;
  }
  if (inline.length === 0) {
    ctx.addIssue({ code: "custom", path: ["cosmology"], message: "choose a cosmology: cosmology=planck18 (see /api/v1/cosmologies) or inline h0 and omegaM" });
    return;
  }
  for (const field of ["h0", "omegaM"] as const) {
    if (value[field] === undefined) ctx.addIssue({ code: "custom", path: [field], message: `${field} is required for an inline cosmology` });
  }
}

export const redshift = z.number().min(0, "redshifts must be ≥ 0").openapi({ description: "Redshift, finite and ≥ 0.", example: 0.5 });

/** A non-empty list of numbers, at most the POST limit (a GET query list is held to LIMITS.valuesPerQuery on parsing). */
export function numberList(item: z.ZodNumber, description: string, example: number[]) {
  return z
    .array(item)
    .min(1, "give at least one value")
    .max(LIMITS.redshiftsPerPost, `at most ${LIMITS.redshiftsPerPost} values per call; split the list, or upload a CSV catalog to /api/v1/catalogs`)
    .openapi({ description: `${description} JSON: an array; query string: comma-separated.`, example, param: commaList });
}

export const redshiftList = numberList(redshift, "Redshifts.", [0.1, 0.5, 1, 2]);

// ---- answers ----

const parametersSchema = z
  .object({
    h0: z.number(),
    omegaM: z.number(),
    omegaDE: z.number().nullable().openapi({ description: "null: flat, omegaDE = 1 − every other density." }),
    tcmb: z.number(),
    nEff: z.number(),
    neutrinoMasses: z.array(z.number()),
    w0: z.number(),
    wa: z.number(),
  })
  .openapi("CosmologyParameters", { description: "Every resolved parameter, defaults filled in (units as for the inline fields)." });

export const cosmologyBlock = z
  .object({
    ref: z.string().nullable().openapi({ description: "slug@version of the preset or profile used; null for an inline cosmology.", example: "planck18@1" }),
    hash: z.string().openapi({ description: "sha256 of the canonical resolved parameters: the same parameters give the same hash, inline or named.", example: "sha256:3f1c…" }),
    parameters: parametersSchema,
    derived: z
      .object({
        omegaK: z.number(),
        omegaGamma: z.number(),
        omegaNu: z.number(),
        omegaNuMassive: z.number(),
        omegaColdMatter: z.number(),
        omegaDE: z.number(),
        ageToday: z.number().nullable().openapi({ description: "Gyr; null when the model has no beginning." }),
        hubbleDistance: z.number().openapi({ description: "c/H0, Mpc." }),
        hubbleTime: z.number().openapi({ description: "1/H0, Gyr." }),
        criticalDensity: z.number().openapi({ description: "Critical density today, kg/m^3." }),
      })
      .openapi({ description: "Quantities derived once per cosmology, in fixed units (Mpc, Gyr, kg/m^3) whatever the requested units." }),
  })
  .openapi("ResolvedCosmology");

export const engineBlock = z.object({ version: z.string().openapi({ example: "1.0.0" }) }).openapi("Engine");

/** Column of numbers; null where the quantity is undefined (e.g. the distance modulus at z = 0). */
export const column = z.array(z.number().nullable());

export function envelope<Units extends z.ZodRawShape, Results extends z.ZodRawShape>(name: string, units: Units, results: Results) {
  return z
    .object({
      cosmology: cosmologyBlock,
      units: z.object({ distance: z.enum(DISTANCE_UNITS), time: z.enum(TIME_UNITS), ...units }),
      engine: engineBlock,
      results: z.object(results).openapi({ description: "Columnar: one array per quantity, index i answers input i." }),
    })
    .openapi(name);
}

export const problemSchema = z
  .object({
    type: z.string().openapi({ example: "urn:comova:problem:invalid-parameters" }),
    title: z.string().openapi({ example: "Invalid parameters" }),
    status: z.number().int().openapi({ example: 422 }),
    detail: z.string().openapi({ example: "z[2]: redshifts must be ≥ 0" }),
    instance: z.string().optional().openapi({ example: "/api/v1/distances" }),
    errors: z.array(z.object({ parameter: z.string(), message: z.string() })).optional(),
  })
  .openapi("Problem", { description: "RFC 9457 problem details; `detail` says what to change." });
