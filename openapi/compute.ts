// Request and answer schemas of the compute endpoints, registered for GET (query) and POST (JSON).
import { LIMITS } from "./limits";
import {
  checkCosmologySelection,
  column,
  cosmologySelectionShape,
  envelope,
  numberList,
  redshift,
  redshiftList,
  unitShape,
} from "./common";
import { registerComputeOperation } from "./responses";
import { z } from "./zod";

type Ctx = z.RefinementCtx;

/** `list` must hold one value (used for every z) or as many as `against`. */
function checkPairedLength(list: number[] | undefined, against: number[], name: string, againstName: string, ctx: Ctx): boolean {
  if (!list || list.length === 1 || list.length === against.length) return true;
  ctx.addIssue({ code: "custom", path: [name], message: `give one ${name} value or one per ${againstName} (${against.length}); got ${list.length}` });
  return false;
}

const pick = (list: number[], i: number) => (list.length === 1 ? list[0] : list[i]);

const selection = { ...cosmologySelectionShape, ...unitShape };

export const DistancesInput = z
  .strictObject({
    z: redshiftList,
    zSource: numberList(redshift, "Optional source redshifts for angularDiameterDistanceToSource (from z to zSource); one value for every z, or one per z, each ≥ its z.", [3]).optional(),
    ...selection,
  })
  .superRefine((value, ctx) => {
    checkCosmologySelection(value, ctx);
    if (!value.zSource || !checkPairedLength(value.zSource, value.z, "zSource", "z", ctx)) return;
    const i = value.z.findIndex((z, i) => pick(value.zSource!, i) < z);
    if (i >= 0) ctx.addIssue({ code: "custom", path: ["zSource"], message: `zSource must be ≥ z; at index ${i} z = ${value.z[i]} but zSource = ${pick(value.zSource, i)}` });
  })
  .openapi("DistancesInput");

export const LookbackTimeInput = z.strictObject({ z: redshiftList, ...selection }).superRefine(checkCosmologySelection).openapi("LookbackTimeInput");

export const AngularSizeInput = z
  .strictObject({
    z: redshiftList,
    size: numberList(z.number().min(0, "size must be ≥ 0"), "Optional proper (physical) sizes, kpc: answers angularSize. One value or one per z.", [10]).optional(),
    angle: numberList(z.number().min(0, "angle must be ≥ 0"), "Optional angles, arcsec: answers physicalSize. One value or one per z.", [1]).optional(),
    ...selection,
  })
  .superRefine((value, ctx) => {
    checkCosmologySelection(value, ctx);
    if (value.size && value.angle) ctx.addIssue({ code: "custom", path: ["angle"], message: "give size or angle, not both" });
    checkPairedLength(value.size, value.z, "size", "z", ctx);
    checkPairedLength(value.angle, value.z, "angle", "z", ctx);
  })
  .openapi("AngularSizeInput");

/** Whole sky in square degrees: 4π sr × (180/π)² deg²/sr. */
export const WHOLE_SKY_DEG2 = 129600 / Math.PI;

export const VolumesInput = z
  .strictObject({
    zMin: numberList(redshift, "Inner redshift of each shell; one value or one per zMax. Default 0.", [0]).optional(),
    zMax: numberList(redshift, "Outer redshift of each shell.", [0.5, 1, 2]),
    area: z
      .number()
      .gt(0, "area must be > 0 deg²")
      .max(WHOLE_SKY_DEG2, `area must be at most the whole sky, ${WHOLE_SKY_DEG2} deg²`)
      .optional()
      .openapi({ description: `Survey area, deg². Default the whole sky (${WHOLE_SKY_DEG2.toFixed(3)} deg²).`, example: 1000 }),
    ...selection,
  })
  .superRefine((value, ctx) => {
    checkCosmologySelection(value, ctx);
    if (!value.zMin || !checkPairedLength(value.zMin, value.zMax, "zMin", "zMax", ctx)) return;
    const i = value.zMax.findIndex((zMax, i) => pick(value.zMin!, i) > zMax);
    if (i >= 0) ctx.addIssue({ code: "custom", path: ["zMin"], message: `zMin must be ≤ zMax; at index ${i} zMin = ${pick(value.zMin, i)} but zMax = ${value.zMax[i]}` });
  })
  .openapi("VolumesInput");

export const ExpansionInput = z.strictObject({ z: redshiftList, ...selection }).superRefine(checkCosmologySelection).openapi("ExpansionInput");

export const INVERTIBLE_QUANTITIES = ["lookbackTime", "age", "comovingDistance", "luminosityDistance", "angularDiameterDistance"] as const;

function inversionList(description: string, example: number[]) {
  return z
    .array(z.number().min(0, "values must be ≥ 0"))
    .min(1, "give at least one value")
    .max(LIMITS.inversionsPerCall, `at most ${LIMITS.inversionsPerCall} values per /redshifts call`)
    .optional()
    .openapi({ description: `${description} JSON: an array; query string: comma-separated.`, example, param: { style: "form", explode: false } });
}

export const RedshiftsInput = z
  .strictObject({
    lookbackTime: inversionList("Lookback times, in timeUnit.", [5]),
    age: inversionList("Ages of the universe, in timeUnit.", [1]),
    comovingDistance: inversionList("Comoving distances, in distanceUnit.", [3000]),
    luminosityDistance: inversionList("Luminosity distances, in distanceUnit.", [5000]),
    angularDiameterDistance: inversionList("Angular-diameter distances, in distanceUnit (below the maximum, two redshifts answer).", [1500]),
    ...selection,
  })
  .superRefine((value, ctx) => {
    checkCosmologySelection(value, ctx);
    const given = INVERTIBLE_QUANTITIES.filter((q) => value[q] !== undefined);
    if (given.length !== 1) {
      ctx.addIssue({ code: "custom", path: [given[1] ?? "lookbackTime"], message: `give exactly one of ${INVERTIBLE_QUANTITIES.join(", ")}; got ${given.length ? given.join(", ") : "none"}` });
    }
  })
  .openapi("RedshiftsInput");

// ---- answers ----

const zColumn = z.array(z.number()).openapi({ description: "The input redshifts, echoed." });
const distanceColumns = {
  comovingDistance: column.openapi({ description: "Line-of-sight comoving distance D_C (Hogg 1999 eq. 15)." }),
  transverseComovingDistance: column.openapi({ description: "Transverse comoving distance D_M (Hogg eq. 16)." }),
  angularDiameterDistance: column.openapi({ description: "Angular-diameter distance D_A = D_M/(1+z) (Hogg eq. 18)." }),
  luminosityDistance: column.openapi({ description: "Luminosity distance D_L = (1+z) D_M (Hogg eq. 21)." }),
  distanceModulus: column.openapi({ description: "Distance modulus 5 log10(D_L / 10 pc), mag; null at z = 0." }),
  lightTravelDistance: column.openapi({ description: "c × lookback time." }),
};

export const DistancesAnswer = envelope("DistancesAnswer", { distanceModulus: z.literal("mag") }, {
  z: zColumn,
  ...distanceColumns,
  zSource: z.array(z.number()).optional(),
  angularDiameterDistanceToSource: column.optional().openapi({ description: "D_A from z to zSource (Hogg eq. 19); with zSource only." }),
});

export const LookbackTimeAnswer = envelope("LookbackTimeAnswer", {}, {
  z: zColumn,
  lookbackTime: column.openapi({ description: "Time since light left z." }),
  age: column.openapi({ description: "Age of the universe at z; null when the model has no beginning." }),
});

export const AngularSizeAnswer = envelope("AngularSizeAnswer", { scale: z.literal("kpc/arcsec"), size: z.literal("kpc"), angle: z.literal("arcsec") }, {
  z: zColumn,
  scale: column.openapi({ description: "Proper size subtended by one arcsecond, kpc/arcsec." }),
  angularSize: column.optional().openapi({ description: "Angle subtended by `size`, arcsec; null at z = 0." }),
  physicalSize: column.optional().openapi({ description: "Proper size subtending `angle`, kpc." }),
}).extend({
  turnaround: z
    .object({ z: z.number(), angularDiameterDistance: z.number(), lookbackTime: z.number() })
    .nullable()
    .openapi({ description: "Where the angular-diameter distance peaks (objects look smallest), in the answer's units; null if it never turns over." }),
});

export const VolumesAnswer = envelope("VolumesAnswer", { volume: z.string().openapi({ example: "Mpc^3" }), differentialComovingVolume: z.string().openapi({ example: "Mpc^3/sr" }) }, {
  zMin: z.array(z.number()),
  zMax: z.array(z.number()),
  comovingVolume: column.openapi({ description: "Comoving volume between zMin and zMax within `area` (Hogg eq. 29)." }),
  differentialComovingVolume: column.openapi({ description: "dV_C/dz/dΩ at zMax, per steradian per unit redshift (Hogg eq. 28)." }),
}).extend({ area: z.number().openapi({ description: "Area used, deg²." }) });

export const ExpansionAnswer = envelope("ExpansionAnswer", { hubbleParameter: z.literal("km/s/Mpc"), criticalDensity: z.literal("kg/m^3") }, {
  z: zColumn,
  hubbleParameter: column.openapi({ description: "H(z), km/s/Mpc." }),
  omegaM: column.openapi({ description: "Matter density at z, in units of the critical density at z." }),
  omegaDE: column,
  omegaR: column.openapi({ description: "Radiation (photons and relativistic neutrinos) at z." }),
  omegaK: column,
  criticalDensity: column.openapi({ description: "Critical density at z, kg/m^3." }),
});

const inverted = z.array(z.number()).optional();
export const RedshiftsAnswer = envelope("RedshiftsAnswer", {}, {
  lookbackTime: inverted,
  age: inverted,
  comovingDistance: inverted,
  luminosityDistance: inverted,
  angularDiameterDistance: inverted,
  z: z.array(z.array(z.number())).openapi({ description: "For each input value, every redshift that gives it, ascending (empty when none does)." }),
});

const planck = { cosmology: "planck18" };

registerComputeOperation({
  path: "/api/v1/distances",
  tag: "distances",
  summary: "Cosmological distances",
  description: "Comoving, transverse comoving, angular-diameter, luminosity and light-travel distances and the distance modulus at each z; with zSource also the angular-diameter distance from z to zSource.",
  input: DistancesInput,
  answer: DistancesAnswer,
  example: { z: [0.1, 0.5, 1, 2], ...planck, distanceUnit: "Mpc" },
});
registerComputeOperation({
  path: "/api/v1/lookback-time",
  tag: "lookbackTime",
  summary: "Lookback time and age",
  description: "Time since light left each z, and the age of the universe at z.",
  input: LookbackTimeInput,
  answer: LookbackTimeAnswer,
  example: { z: [0.5, 1, 3], ...planck, timeUnit: "Gyr" },
});
registerComputeOperation({
  path: "/api/v1/angular-size",
  tag: "angularSize",
  summary: "Angular scale and sizes",
  description: "kpc per arcsec at each z; with size (kpc) the angle it subtends, with angle (arcsec) the size that subtends it; and the turnaround redshift where objects look smallest.",
  input: AngularSizeInput,
  answer: AngularSizeAnswer,
  example: { z: [0.5, 1, 2], size: [10], ...planck },
});
registerComputeOperation({
  path: "/api/v1/volumes",
  tag: "volumes",
  summary: "Comoving volumes",
  description: "Comoving volume of each shell zMin–zMax over `area`, and the differential comoving volume at zMax.",
  input: VolumesInput,
  answer: VolumesAnswer,
  example: { zMin: [0], zMax: [0.5, 1], area: 1000, ...planck, distanceUnit: "Gpc" },
});
registerComputeOperation({
  path: "/api/v1/expansion",
  tag: "expansion",
  summary: "Expansion history",
  description: "Hubble parameter, density parameters and critical density at each z.",
  input: ExpansionInput,
  answer: ExpansionAnswer,
  example: { z: [0, 1, 10], ...planck },
});
registerComputeOperation({
  path: "/api/v1/redshifts",
  tag: "redshifts",
  summary: "Redshifts from a distance or a time",
  description: "Inverts one quantity: for each value, every redshift at which it is reached (an angular-diameter distance below its maximum is reached twice).",
  input: RedshiftsInput,
  answer: RedshiftsAnswer,
  example: { lookbackTime: [1, 5, 10], ...planck, timeUnit: "Gyr" },
});
