import { CosmologyError } from "./errors";
import type { CosmologyParameters } from "./parameters";

/** Values derived once per cosmology. Densities are today's, as fractions of the critical density. */
export interface Derived {
  omegaK: number;
  omegaGamma: number;
  /** All neutrinos today: massless species plus the massive ones' current density. */
  omegaNu: number;
  omegaNuMassive: number;
  /** omegaM − omegaNuMassive. */
  omegaColdMatter: number;
  omegaDE: number;
  /** Gyr; null when the model has no beginning (e.g. de Sitter: the age integral diverges). */
  ageToday: number | null;
  /** c/H0, Mpc. */
  hubbleDistance: number;
  /** 1/H0, Gyr. */
  hubbleTime: number;
  /** 3 H0^2 / (8 π G), kg/m^3. */
  criticalDensity: number;
}

export interface Distances {
  comovingDistance: Float64Array;
  transverseComovingDistance: Float64Array;
  angularDiameterDistance: Float64Array;
  luminosityDistance: Float64Array;
  distanceModulus: Float64Array;
  lightTravelDistance: Float64Array;
}

export interface Expansion {
  hubbleParameter: Float64Array;
  omegaM: Float64Array;
  omegaDE: Float64Array;
  omegaR: Float64Array;
  omegaK: Float64Array;
  criticalDensity: Float64Array;
}

export interface Turnaround {
  z: number;
  angularDiameterDistance: number;
  lookbackTime: number;
}

export type InvertibleQuantity = "lookbackTime" | "age" | "comovingDistance" | "luminosityDistance" | "angularDiameterDistance";

export interface Cosmology {
  readonly parameters: CosmologyParameters;
  readonly derived: Derived;
  distances(z: Float64Array): Distances;
  angularDiameterDistanceBetween(z1: Float64Array, z2: Float64Array): Float64Array;
  times(z: Float64Array): { lookbackTime: Float64Array; age: Float64Array };
  expansion(z: Float64Array): Expansion;
  scale(z: Float64Array): Float64Array;
  comovingVolume(z: Float64Array): Float64Array;
  differentialComovingVolume(z: Float64Array): Float64Array;
  turnaround(): Turnaround | null;
  redshiftsFor(quantity: InvertibleQuantity, value: number): number[];
}

export function createCosmology(_p: CosmologyParameters): Cosmology {
  throw new CosmologyError("h0", "not yet implemented");
}
