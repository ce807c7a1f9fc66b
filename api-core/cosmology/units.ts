import { GIGAYEAR, LIGHT_YEAR, MEGAPARSEC } from "./constants";

export const DISTANCE_UNITS = ["Mpc", "kpc", "Gpc", "Mly", "Gly", "m", "Mpc/h"] as const;
export type DistanceUnit = (typeof DISTANCE_UNITS)[number];

export const TIME_UNITS = ["Gyr", "Myr", "yr", "s"] as const;
export type TimeUnit = (typeof TIME_UNITS)[number];

/**
 * Factor that turns a distance in Mpc into `unit`. "Mpc/h" is the value times h = H0/100
 * (common practice: a distance quoted in h^-1 Mpc). Light years use the Julian year (IAU).
 * Volumes in unit^3 use the cube of this factor.
 */
export function distanceUnitFactor(unit: DistanceUnit, h0: number): number {
  switch (unit) {
    case "Mpc":
      return 1;
    case "kpc":
      return 1e3;
    case "Gpc":
      return 1e-3;
    case "Mly":
      return MEGAPARSEC / (1e6 * LIGHT_YEAR);
    case "Gly":
      return MEGAPARSEC / (1e9 * LIGHT_YEAR);
    case "m":
      return MEGAPARSEC;
    case "Mpc/h":
      return h0 / 100;
  }
}

/** Factor that turns a time in Gyr (1e9 Julian years) into `unit`. */
export function timeUnitFactor(unit: TimeUnit): number {
  switch (unit) {
    case "Gyr":
      return 1;
    case "Myr":
      return 1e3;
    case "yr":
      return 1e9;
    case "s":
      return GIGAYEAR;
  }
}

