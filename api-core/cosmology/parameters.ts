import { createHash } from "node:crypto";
import { CMB_TEMPERATURE, STANDARD_NEFF } from "./constants";
import { CosmologyError } from "./errors";

/** What a caller may give: everything but h0 and omegaM has a default. */
export interface CosmologyInput {
  h0: number;
  omegaM: number;
  omegaDE?: number | null;
  tcmb?: number;
  nEff?: number;
  neutrinoMasses?: number[];
  w0?: number;
  wa?: number;
}

/** Fully resolved parameters. `omegaDE: null` means "flat": omegaDE = 1 − omegaM − omegaR. */
export interface CosmologyParameters {
  /** Hubble constant, km/s/Mpc. */
  h0: number;
  /** Non-relativistic matter today, including massive neutrinos (as published tables quote it). */
  omegaM: number;
  /** Dark energy today; null = flat universe (omegaDE chosen so that omegaK = 0). */
  omegaDE: number | null;
  /** CMB temperature today, K; 0 switches all radiation off (photons and every neutrino). */
  tcmb: number;
  /** Effective number of neutrino species. */
  nEff: number;
  /** Masses of the massive species, eV, sorted ascending; the remaining of 3 species are massless. */
  neutrinoMasses: number[];
  /** CPL dark energy w(a) = w0 + wa (1 − a); Chevallier & Polarski (2001), Linder (2003). */
  w0: number;
  wa: number;
}

/** Number of neutrino species sharing nEff (DESIGN.md §2). */
export const NEUTRINO_SPECIES = 3;

/**
 * Accepted ranges. Wide enough for any physical model; narrow enough that no output can overflow
 * (every distance in metres, volume in m^3 and time in seconds stays finite up to MAX_REDSHIFT).
 */
export const PARAMETER_LIMITS = {
  h0: { min: 0.01, max: 10_000, unit: "km/s/Mpc" },
  omegaM: { min: 0, max: 100, unit: "" },
  omegaDE: { min: 0, max: 100, unit: "" },
  tcmb: { min: 0, max: 100, unit: "K" },
  nEff: { min: 0, max: 30, unit: "" },
  neutrinoMass: { min: 0, max: 1000, unit: "eV" },
  w0: { min: -3, max: 3, unit: "" },
  wa: { min: -3, max: 3, unit: "" },
} as const;

function checkNumber(name: string, value: unknown, limits: { min: number; max: number; unit: string }): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new CosmologyError(name, `${name} must be a finite number.`);
  }
  if (value < limits.min || value > limits.max) {
    const unit = limits.unit ? ` ${limits.unit}` : "";
    throw new CosmologyError(name, `${name} = ${value} is outside the supported range [${limits.min}, ${limits.max}]${unit}.`);
  }
  return value === 0 ? 0 : value; // folds -0 into 0 so equal models hash equally
}

/**
 * Fill in defaults (tcmb 2.7255 K, nEff 3.046, no massive neutrinos, w0 = −1, wa = 0) and check
 * each value on its own. Checks that need the physics (no big bang, neutrinos heavier than omegaM)
 * happen in createCosmology.
 */
export function resolveParameters(input: CosmologyInput): CosmologyParameters {
  if (typeof input !== "object" || input === null) {
    throw new CosmologyError("h0", "Give at least h0 (km/s/Mpc) and omegaM.");
  }
  if (input.h0 !== undefined && typeof input.h0 === "number" && input.h0 <= 0) {
    throw new CosmologyError("h0", `h0 must be positive (km/s/Mpc); got ${input.h0}.`);
  }
  const h0 = checkNumber("h0", input.h0, PARAMETER_LIMITS.h0);
  if (typeof input.omegaM === "number" && input.omegaM < 0) {
    throw new CosmologyError("omegaM", `omegaM must not be negative; got ${input.omegaM}.`);
  }
  const omegaM = checkNumber("omegaM", input.omegaM, PARAMETER_LIMITS.omegaM);
  if (typeof input.omegaDE === "number" && input.omegaDE < 0) {
    throw new CosmologyError("omegaDE", `omegaDE must not be negative; got ${input.omegaDE}.`);
  }
  const omegaDE = input.omegaDE == null ? null : checkNumber("omegaDE", input.omegaDE, PARAMETER_LIMITS.omegaDE);
  const tcmb = input.tcmb === undefined ? CMB_TEMPERATURE : checkNumber("tcmb", input.tcmb, PARAMETER_LIMITS.tcmb);
  const nEff = input.nEff === undefined ? STANDARD_NEFF : checkNumber("nEff", input.nEff, PARAMETER_LIMITS.nEff);
  const w0 = input.w0 === undefined ? -1 : checkNumber("w0", input.w0, PARAMETER_LIMITS.w0);
  const wa = input.wa === undefined ? 0 : checkNumber("wa", input.wa, PARAMETER_LIMITS.wa);

  const masses = input.neutrinoMasses ?? [];
  if (!Array.isArray(masses)) {
    throw new CosmologyError("neutrinoMasses", "neutrinoMasses must be a list of masses in eV.");
  }
  if (masses.length > NEUTRINO_SPECIES) {
    throw new CosmologyError(
      "neutrinoMasses",
      `At most ${NEUTRINO_SPECIES} neutrino species can be massive; got ${masses.length} masses.`,
    );
  }
  const neutrinoMasses = masses
    .map((mass) => {
      if (typeof mass === "number" && mass < 0) {
        throw new CosmologyError("neutrinoMasses", `Neutrino masses must not be negative; got ${mass} eV.`);
      }
      return checkNumber("neutrinoMasses", mass, PARAMETER_LIMITS.neutrinoMass);
    })
    .sort((a, b) => a - b);

  return { h0, omegaM, omegaDE, tcmb, nEff, neutrinoMasses, w0, wa };
}

/**
 * Canonical JSON of the parameters: fixed key order, masses sorted, numbers as JavaScript's
 * shortest round-trip decimal strings (ECMA-262 Number::toString).
 */
export function canonicalParameterJson(p: CosmologyParameters): string {
  const canonical = {
    h0: p.h0,
    omegaM: p.omegaM,
    omegaDE: p.omegaDE,
    tcmb: p.tcmb,
    nEff: p.nEff,
    neutrinoMasses: [...p.neutrinoMasses].sort((a, b) => a - b),
    w0: p.w0,
    wa: p.wa,
  };
  return JSON.stringify(canonical, (_key, value) => (value === 0 ? 0 : value));
}

/** "sha256:<64 hex>" of the canonical JSON; same parameters → same hash. */
export function parameterHash(p: CosmologyParameters): string {
  return "sha256:" + createHash("sha256").update(canonicalParameterJson(p)).digest("hex");
}
