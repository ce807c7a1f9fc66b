// One function per compute endpoint: validated input → answer envelope. Framework-free.
import type { CosmologyInput } from "@/api-core/cosmology";
import { begin, broadcast, column, envelope, type Metering, type UnitSelection } from "./envelope";
import { distancesAt } from "./quantities";

type Selection = { cosmology?: string } & Partial<CosmologyInput> & UnitSelection;

const WHOLE_SKY_DEG2 = 129600 / Math.PI;

export async function distances(input: Selection & { z: number[]; zSource?: number[] }, meter: Metering) {
  const { cosmology, units } = await begin(input, meter, input.z.length * (input.zSource ? 2 : 1));
  const z = Float64Array.from(input.z);
  const d = distancesAt(cosmology.model, z);
  const f = units.distanceFactor;
  const results = {
    z: input.z,
    comovingDistance: column(d.comovingDistance, f),
    transverseComovingDistance: column(d.transverseComovingDistance, f),
    angularDiameterDistance: column(d.angularDiameterDistance, f),
    luminosityDistance: column(d.luminosityDistance, f),
    distanceModulus: column(d.distanceModulus),
    lightTravelDistance: column(d.lightTravelDistance, f),
    ...(input.zSource && {
      zSource: Array.from(broadcast(input.zSource, z.length)),
      angularDiameterDistanceToSource: column(cosmology.model.angularDiameterDistanceBetween(z, broadcast(input.zSource, z.length)), f),
    }),
  };
  return envelope(cosmology, units, { distanceModulus: "mag" as const }, results);
}

export async function lookbackTime(input: Selection & { z: number[] }, meter: Metering) {
  const { cosmology, units } = await begin(input, meter, input.z.length);
  const t = cosmology.model.times(Float64Array.from(input.z));
  return envelope(cosmology, units, {}, { z: input.z, lookbackTime: column(t.lookbackTime, units.timeFactor), age: column(t.age, units.timeFactor) });
}

export async function angularSize(input: Selection & { z: number[]; size?: number[]; angle?: number[] }, meter: Metering) {
  const { cosmology, units } = await begin(input, meter, input.z.length);
  const z = Float64Array.from(input.z);
  const scale = cosmology.model.scale(z);
  const results: { z: number[]; scale: (number | null)[]; angularSize?: (number | null)[]; physicalSize?: (number | null)[] } = { z: input.z, scale: column(scale) };
  if (input.size) {
    const size = broadcast(input.size, z.length);
    results.angularSize = column(size.map((s, i) => s / scale[i]));
  }
  if (input.angle) {
    const angle = broadcast(input.angle, z.length);
    results.physicalSize = column(angle.map((a, i) => a * scale[i]));
  }
  const peak = cosmology.model.turnaround();
  const turnaround = peak && {
    z: peak.z,
    angularDiameterDistance: peak.angularDiameterDistance * units.distanceFactor,
    lookbackTime: peak.lookbackTime * units.timeFactor,
  };
  return { ...envelope(cosmology, units, { scale: "kpc/arcsec" as const, size: "kpc" as const, angle: "arcsec" as const }, results), turnaround };
}

export async function volumes(input: Selection & { zMin?: number[]; zMax: number[]; area?: number }, meter: Metering) {
  const { cosmology, units } = await begin(input, meter, input.zMax.length * (input.zMin ? 2 : 1));
  const zMax = Float64Array.from(input.zMax);
  const zMin = broadcast(input.zMin ?? [0], zMax.length);
  const area = input.area ?? WHOLE_SKY_DEG2;
  const outer = cosmology.model.comovingVolume(zMax);
  const inner = input.zMin ? cosmology.model.comovingVolume(zMin) : new Float64Array(zMax.length);
  const cube = units.distanceFactor ** 3;
  const shell = outer.map((v, i) => (v - inner[i]) * (area / WHOLE_SKY_DEG2));
  const volumeUnit = units.distance === "Mpc/h" ? "(Mpc/h)^3" : `${units.distance}^3`;
  return {
    ...envelope(cosmology, units, { volume: volumeUnit, differentialComovingVolume: `${volumeUnit}/sr` }, {
      zMin: Array.from(zMin),
      zMax: input.zMax,
      comovingVolume: column(shell, cube),
      differentialComovingVolume: column(cosmology.model.differentialComovingVolume(zMax), cube),
    }),
    area,
  };
}

export async function expansion(input: Selection & { z: number[] }, meter: Metering) {
  const { cosmology, units } = await begin(input, meter, input.z.length);
  const e = cosmology.model.expansion(Float64Array.from(input.z));
  return envelope(cosmology, units, { hubbleParameter: "km/s/Mpc" as const, criticalDensity: "kg/m^3" as const }, {
    z: input.z,
    hubbleParameter: column(e.hubbleParameter),
    omegaM: column(e.omegaM),
    omegaDE: column(e.omegaDE),
    omegaR: column(e.omegaR),
    omegaK: column(e.omegaK),
    criticalDensity: column(e.criticalDensity),
  });
}

const TIMES = ["lookbackTime", "age"] as const;
const DISTANCES = ["comovingDistance", "luminosityDistance", "angularDiameterDistance"] as const;
type Invertible = (typeof TIMES)[number] | (typeof DISTANCES)[number];

export async function redshifts(input: Selection & Partial<Record<Invertible, number[]>>, meter: Metering) {
  const quantity = ([...TIMES, ...DISTANCES] as Invertible[]).find((q) => input[q] !== undefined)!;
  const values = input[quantity]!;
  const { cosmology, units } = await begin(input, meter, values.length);
  // Values arrive in the requested unit; the engine inverts in Mpc and Gyr.
  const toEngine = 1 / ((TIMES as readonly string[]).includes(quantity) ? units.timeFactor : units.distanceFactor);
  const z = values.map((v) => cosmology.model.redshiftsFor(quantity, v * toEngine));
  return envelope(cosmology, units, {}, { [quantity]: values, z });
}
