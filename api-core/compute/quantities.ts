// The per-redshift quantities a catalog can ask for, named as in the endpoints' results, each with
// the unit it is written in. Quantities of one family (e.g. all distances) are computed together.
import type { Cosmology, Distances } from "@/api-core/cosmology";
import type { ResolvedUnits } from "./envelope";

type Family = "distances" | "times" | "expansion" | "scale" | "comovingVolume" | "differentialComovingVolume";
type UnitKind = "distance" | "time" | "volume" | "fixed";

interface QuantityDefinition {
  family: Family;
  unit: UnitKind;
  /** Unit of a "fixed" quantity. */
  fixedUnit?: string;
}

export const QUANTITIES: Record<string, QuantityDefinition> = {
  comovingDistance: { family: "distances", unit: "distance" },
  transverseComovingDistance: { family: "distances", unit: "distance" },
  angularDiameterDistance: { family: "distances", unit: "distance" },
  luminosityDistance: { family: "distances", unit: "distance" },
  distanceModulus: { family: "distances", unit: "fixed", fixedUnit: "mag" },
  lightTravelDistance: { family: "distances", unit: "distance" },
  lookbackTime: { family: "times", unit: "time" },
  age: { family: "times", unit: "time" },
  scale: { family: "scale", unit: "fixed", fixedUnit: "kpc/arcsec" },
  hubbleParameter: { family: "expansion", unit: "fixed", fixedUnit: "km/s/Mpc" },
  omegaM: { family: "expansion", unit: "fixed", fixedUnit: "1" },
  omegaDE: { family: "expansion", unit: "fixed", fixedUnit: "1" },
  omegaR: { family: "expansion", unit: "fixed", fixedUnit: "1" },
  omegaK: { family: "expansion", unit: "fixed", fixedUnit: "1" },
  criticalDensity: { family: "expansion", unit: "fixed", fixedUnit: "kg/m^3" },
  comovingVolume: { family: "comovingVolume", unit: "volume" },
  differentialComovingVolume: { family: "differentialComovingVolume", unit: "volume" },
};

/**
 * The engine's distances, also at z = 0, which it refuses because the distance modulus is −∞ there:
 * every distance is 0 at z = 0 by definition, and the modulus is left −∞ (null in JSON, empty in CSV).
 */
export function distancesAt(model: Cosmology, z: Float64Array): Distances {
  if (!z.includes(0)) return model.distances(z);
  const positive = z.filter((v) => v !== 0);
  const computed = positive.length ? model.distances(positive) : null;
  const result = {} as Record<keyof Distances, Float64Array>;
  for (const name of Object.keys(QUANTITIES).filter((q) => QUANTITIES[q].family === "distances") as (keyof Distances)[]) {
    const out = new Float64Array(z.length);
    for (let i = 0, k = 0; i < z.length; i++) {
      out[i] = z[i] === 0 ? (name === "distanceModulus" ? -Infinity : 0) : computed![name][k++];
    }
    result[name] = out;
  }
  return result;
}

function familyValues(model: Cosmology, family: Family, z: Float64Array): Record<string, Float64Array> {
  switch (family) {
    case "distances":
      return { ...distancesAt(model, z) };
    case "times":
      return model.times(z);
    case "expansion":
      return { ...model.expansion(z) };
    case "scale":
      return { scale: model.scale(z) };
    case "comovingVolume":
      return { comovingVolume: model.comovingVolume(z) };
    case "differentialComovingVolume":
      return { differentialComovingVolume: model.differentialComovingVolume(z) };
  }
}

function factor(unit: UnitKind, units: ResolvedUnits): number {
  if (unit === "distance") return units.distanceFactor;
  if (unit === "time") return units.timeFactor;
  if (unit === "volume") return units.distanceFactor ** 3;
  return 1;
}

/** Each requested quantity at every z, in the requested units. */
export function computeQuantities(model: Cosmology, names: readonly string[], z: Float64Array, units: ResolvedUnits): Float64Array[] {
  const families = new Map<Family, Record<string, Float64Array>>();
  return names.map((name) => {
    const { family, unit } = QUANTITIES[name];
    if (!families.has(family)) families.set(family, familyValues(model, family, z));
    const values = families.get(family)![name];
    const f = factor(unit, units);
    return f === 1 ? values : values.map((v) => v * f);
  });
}

/** "distance=Mpc; time=Gyr; …" for the units of the requested quantities (the CSV answer's header). */
export function describeUnits(names: readonly string[], units: ResolvedUnits): string {
  const volume = units.distance === "Mpc/h" ? "(Mpc/h)^3" : `${units.distance}^3`;
  return names
    .map((name) => {
      const q = QUANTITIES[name];
      const unit = q.unit === "distance" ? units.distance : q.unit === "time" ? units.time : q.unit === "volume" ? (name === "comovingVolume" ? volume : `${volume}/sr`) : q.fixedUnit;
      return `${name}=${unit}`;
    })
    .join("; ");
}
