// The answer envelope every compute endpoint returns (DESIGN §3): resolved cosmology, units, engine, results.
import { ENGINE_VERSION, distanceUnitFactor, timeUnitFactor, type DistanceUnit, type TimeUnit } from "@/api-core/cosmology";
import { resolveCosmology, type CosmologySelection, type ResolvedCosmology } from "@/api-core/profiles";

/** What a compute needs from the route's guard (structurally the guard's call context). */
export interface Metering {
  key: { teamId: string };
  /** Spends evaluation units before the work is done; throws (429/403) when over quota. */
  charge(units: number): Promise<void>;
  note(entry: { cosmologyHash?: string; cosmologyRef?: string | null }): void;
}

export interface UnitSelection {
  distanceUnit?: DistanceUnit;
  timeUnit?: TimeUnit;
}

export interface ResolvedUnits {
  distance: DistanceUnit;
  time: TimeUnit;
  /** Multiplies a distance in Mpc. */
  distanceFactor: number;
  /** Multiplies a time in Gyr. */
  timeFactor: number;
}

/** Resolves the cosmology, records it for the request log and spends `units` before any computing. */
export async function begin(input: CosmologySelection & UnitSelection, meter: Metering, units: number) {
  const cosmology = await resolveCosmology(input, meter.key.teamId);
  meter.note({ cosmologyHash: cosmology.hash, cosmologyRef: cosmology.ref });
  await meter.charge(units);
  const distance = input.distanceUnit ?? "Mpc";
  const time = input.timeUnit ?? "Gyr";
  const resolvedUnits: ResolvedUnits = {
    distance,
    time,
    distanceFactor: distanceUnitFactor(distance, cosmology.parameters.h0),
    timeFactor: timeUnitFactor(time),
  };
  return { cosmology, units: resolvedUnits };
}

export function cosmologyBlock(cosmology: ResolvedCosmology) {
  return { ref: cosmology.ref, hash: cosmology.hash, parameters: cosmology.parameters, derived: cosmology.model.derived };
}

export function envelope<Units extends object, Results extends object>(cosmology: ResolvedCosmology, units: ResolvedUnits, extraUnits: Units, results: Results) {
  return {
    cosmology: cosmologyBlock(cosmology),
    units: { distance: units.distance, time: units.time, ...extraUnits },
    engine: { version: ENGINE_VERSION },
    results,
  };
}

/** A JSON column in the requested unit; a value that is not finite (e.g. a distance modulus at z = 0) becomes null. */
export function column(values: Float64Array, factor = 1): (number | null)[] {
  const out = new Array<number | null>(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i] * factor;
    out[i] = Number.isFinite(v) ? v : null;
  }
  return out;
}

/** `list` broadcast to `length` (a one-value list applies to every index). */
export function broadcast(list: number[], length: number): Float64Array {
  return list.length === 1 ? new Float64Array(length).fill(list[0]) : Float64Array.from(list);
}
