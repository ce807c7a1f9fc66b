// Public surface of the cosmology engine. Nothing outside this folder is imported.
export { ENGINE_VERSION } from "./version";
export { CosmologyError } from "./errors";
export type { CosmologyInput, CosmologyParameters } from "./parameters";
export { resolveParameters, parameterHash, canonicalParameterJson, PARAMETER_LIMITS, NEUTRINO_SPECIES } from "./parameters";
export type { Preset } from "./presets";
export { PRESETS } from "./presets";
export type { Cosmology, Derived, Distances, Times, Expansion, Turnaround, InvertibleQuantity } from "./cosmology";
export { createCosmology, MAX_REDSHIFT } from "./cosmology";
export type { DistanceUnit, TimeUnit } from "./units";
export { DISTANCE_UNITS, TIME_UNITS, distanceUnitFactor, timeUnitFactor } from "./units";
export * as constants from "./constants";
