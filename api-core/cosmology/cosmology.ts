import { Background, MAX_REDSHIFT } from "./background";
import { CosmologyError } from "./errors";
import { parameterHash, resolveParameters, type CosmologyParameters } from "./parameters";
import { IntegralTable, TABLE_TOP } from "./table";

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

export type Times = {
  lookbackTime: Float64Array;
  age: Float64Array;
};

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
  times(z: Float64Array): Times;
  /** Every distance and both times from one interpolant evaluation per redshift (z > 0; finite age). */
  distancesAndTimes(z: Float64Array): Distances & Times;
  expansion(z: Float64Array): Expansion;
  scale(z: Float64Array): Float64Array;
  /** Between 0 and z; whole sky unless `area` (deg²) is given. */
  comovingVolume(z: Float64Array, area?: number): Float64Array;
  differentialComovingVolume(z: Float64Array): Float64Array;
  turnaround(): Turnaround | null;
  redshiftsFor(quantity: InvertibleQuantity, value: number): number[];
  /** Proper size (kpc) of an object at z spanning `angle` arcsec. */
  physicalSize(z: Float64Array, angle: Float64Array): Float64Array;
  /** Angle (arcsec) spanned by an object of proper size `size` kpc at z; z must be > 0. */
  angularSize(z: Float64Array, size: Float64Array): Float64Array;
  /** Largest relative error of the interpolated integrands, measured when the cosmology was built. */
  readonly interpolationError: number;
}

const ARCSEC_PER_RADIAN = (180 * 3600) / Math.PI;
const FULL_SKY_DEG2 = (4 * Math.PI * 180 * 180) / (Math.PI * Math.PI);

/** Root and extremum searches: grid step in u, then bisection to the last representable digit. */
const SEARCH_STEP = 1 / 64;

function checkRedshifts(z: Float64Array, name = "z"): void {
  for (let i = 0; i < z.length; i++) {
    const value = z[i];
    if (!(value >= 0 && value <= MAX_REDSHIFT)) {
      throw new CosmologyError(name, `${name}[${i}] = ${value}: each redshift must be a finite number between 0 and ${MAX_REDSHIFT}.`);
    }
  }
}

/** Bisection on [low, high] for a sign change of f, down to adjacent doubles. */
function bisect(f: (u: number) => number, low: number, high: number): number {
  let fLow = f(low);
  for (let i = 0; i < 200; i++) {
    const middle = (low + high) / 2;
    if (middle <= low || middle >= high) break;
    const fMiddle = f(middle);
    if (fMiddle === 0) return middle;
    if (fMiddle < 0 === fLow < 0) {
      low = middle;
      fLow = fMiddle;
    } else high = middle;
  }
  return (low + high) / 2;
}

/** x − sin x (sign −1) or sinh x − x (sign +1) without cancellation for small x: Σ_{n≥1} (±1)^{n+1} x^{2n+1}/(2n+1)!. */
function oddSeriesRemainder(x: number, sign: 1 | -1): number {
  if (x > 0.5) return sign > 0 ? Math.sinh(x) - x : x - Math.sin(x);
  let term = (x * x * x) / 6;
  let sum = term;
  for (let n = 2; n < 12; n++) {
    term *= (sign * x * x) / ((2 * n) * (2 * n + 1));
    sum += term;
  }
  return sum;
}

class Engine implements Cosmology {
  readonly derived: Derived;
  readonly interpolationError: number;
  private readonly hubbleDistance: number;
  private readonly hubbleTime: number;
  private readonly curvatureScale: number; // √|Ω_k|
  private readonly omegaK: number;
  private turnaroundCache: Turnaround | null | undefined;
  private extremaCache = new Map<InvertibleQuantity, number[]>();

  constructor(
    readonly parameters: CosmologyParameters,
    private readonly background: Background,
    private readonly table: IntegralTable,
  ) {
    this.hubbleDistance = background.hubbleDistance;
    this.hubbleTime = background.hubbleTime;
    this.curvatureScale = Math.sqrt(Math.abs(background.omegaK));
    this.omegaK = background.omegaK;
    this.interpolationError = table.measuredError;
    this.derived = {
      omegaK: background.omegaK,
      omegaGamma: background.omegaGamma,
      omegaNu: background.omegaRadiation - background.omegaGamma + background.omegaNuMassive,
      omegaNuMassive: background.omegaNuMassive,
      omegaColdMatter: background.omegaColdMatter,
      omegaDE: background.omegaDE,
      ageToday: table.ageIntegral === null ? null : table.ageIntegral * background.hubbleTime,
      hubbleDistance: background.hubbleDistance,
      hubbleTime: background.hubbleTime,
      criticalDensity: background.criticalDensity,
    };
  }

  /**
   * D_M/D_H from D_C/D_H (Hogg 1999, eq. 16): sinh for Ω_k > 0, sin for Ω_k < 0. Beyond the
   * antipode of a closed universe sin turns negative (inverted images); we return the magnitude.
   */
  private transverse(comoving: number): number {
    const omegaK = this.omegaK;
    if (omegaK === 0) return comoving;
    const k = this.curvatureScale;
    return omegaK > 0 ? Math.sinh(k * comoving) / k : Math.abs(Math.sin(k * comoving)) / k;
  }

  distances(z: Float64Array): Distances {
    return this.evaluateDistances(z, null);
  }

  distancesAndTimes(z: Float64Array): Distances & Times {
    this.requireFiniteAge();
    const times = { lookbackTime: new Float64Array(z.length), age: new Float64Array(z.length) };
    return { ...this.evaluateDistances(z, times), ...times };
  }

  /** One interpolant evaluation per redshift for every distance and, when `times` is given, the times too. */
  private evaluateDistances(z: Float64Array, times: Times | null): Distances {
    checkRedshifts(z);
    const n = z.length;
    const comovingDistance = new Float64Array(n);
    const transverseComovingDistance = new Float64Array(n);
    const angularDiameterDistance = new Float64Array(n);
    const luminosityDistance = new Float64Array(n);
    const distanceModulus = new Float64Array(n);
    const lightTravelDistance = new Float64Array(n);
    const table = this.table;
    const hubbleDistance = this.hubbleDistance;
    const hubbleTime = this.hubbleTime;
    for (let i = 0; i < n; i++) {
      const onePlusZ = 1 + z[i];
      table.evaluate(Math.log1p(z[i]));
      const transverse = hubbleDistance * this.transverse(table.comoving);
      const luminosity = transverse * onePlusZ;
      if (luminosity === 0) {
        throw new CosmologyError("z", `z[${i}] = ${z[i]}: the distance modulus is −∞ where the luminosity distance is 0 (z = 0); ask for z > 0.`);
      }
      comovingDistance[i] = hubbleDistance * table.comoving;
      transverseComovingDistance[i] = transverse;
      angularDiameterDistance[i] = transverse / onePlusZ;
      luminosityDistance[i] = luminosity; // Hogg 1999, eq. 21
      distanceModulus[i] = 5 * Math.log10(luminosity) + 25; // Hogg eq. 24: 5 log10(D_L / 10 pc), D_L in Mpc
      lightTravelDistance[i] = hubbleDistance * table.lookback; // c × lookback time
      if (times) {
        times.lookbackTime[i] = hubbleTime * table.lookback; // Hogg 1999, eq. 30
        times.age[i] = hubbleTime * table.ageAfterEvaluate();
      }
    }
    return { comovingDistance, transverseComovingDistance, angularDiameterDistance, luminosityDistance, distanceModulus, lightTravelDistance };
  }

  /**
   * D_A between z1 ≤ z2 (Hogg 1999, eq. 19, written as S_k(χ2 − χ1)/(1+z2)): the sin/sinh of the
   * comoving separation, which equals Hogg's √(1+Ω_k D_M²/D_H²) form where that holds and stays
   * correct past the equator of a closed universe.
   */
  angularDiameterDistanceBetween(z1: Float64Array, z2: Float64Array): Float64Array {
    checkRedshifts(z1);
    checkRedshifts(z2, "zSource");
    if (z1.length !== z2.length) throw new CosmologyError("zSource", "Give one source redshift per redshift.");
    const result = new Float64Array(z1.length);
    for (let i = 0; i < z1.length; i++) {
      if (z2[i] < z1[i]) throw new CosmologyError("zSource", `zSource[${i}] = ${z2[i]} must not be below z[${i}] = ${z1[i]}.`);
      const between = this.table.comovingBetween(Math.log1p(z1[i]), Math.log1p(z2[i]));
      result[i] = (this.hubbleDistance * this.transverse(between)) / (1 + z2[i]);
    }
    return result;
  }

  times(z: Float64Array): Times {
    checkRedshifts(z);
    this.requireFiniteAge();
    const lookbackTime = new Float64Array(z.length);
    const age = new Float64Array(z.length);
    const table = this.table;
    for (let i = 0; i < z.length; i++) {
      table.evaluate(Math.log1p(z[i]));
      lookbackTime[i] = this.hubbleTime * table.lookback; // Hogg 1999, eq. 30
      age[i] = this.hubbleTime * table.ageAfterEvaluate();
    }
    return { lookbackTime, age };
  }

  private requireFiniteAge(): void {
    if (this.table.ageIntegral === null) {
      throw new CosmologyError(
        "omegaM",
        "This model has no big bang (only vacuum energy at early times, as in de Sitter), so ages are infinite. " +
          "Give omegaM > 0 or tcmb > 0; light-travel distances (c × lookback time) are still available.",
      );
    }
  }

  expansion(z: Float64Array): Expansion {
    checkRedshifts(z);
    const n = z.length;
    const result: Expansion = {
      hubbleParameter: new Float64Array(n),
      omegaM: new Float64Array(n),
      omegaDE: new Float64Array(n),
      omegaR: new Float64Array(n),
      omegaK: new Float64Array(n),
      criticalDensity: new Float64Array(n),
    };
    const background = this.background;
    for (let i = 0; i < n; i++) {
      const onePlusZ = 1 + z[i];
      const u = Math.log1p(z[i]);
      const square = onePlusZ * onePlusZ;
      const hubbleSquared = background.hubbleSquared(u, onePlusZ);
      result.hubbleParameter[i] = this.parameters.h0 * Math.sqrt(hubbleSquared);
      result.omegaM[i] = background.matterDensity(onePlusZ) / hubbleSquared;
      result.omegaDE[i] = (background.omegaDE * background.darkEnergyFactor(u)) / hubbleSquared;
      result.omegaR[i] = (background.omegaRadiation * square * square) / hubbleSquared;
      result.omegaK[i] = (background.omegaK * square) / hubbleSquared;
      result.criticalDensity[i] = background.criticalDensity * hubbleSquared; // 3H(z)²/(8πG)
    }
    return result;
  }

  /** Proper kpc per arcsec: D_A (kpc) / (arcsec per radian). */
  scale(z: Float64Array): Float64Array {
    const distances = this.distancesWithoutModulus(z);
    return distances.map((angular) => (angular * 1e3) / ARCSEC_PER_RADIAN);
  }

  physicalSize(z: Float64Array, angle: Float64Array): Float64Array {
    if (angle.length !== z.length) throw new CosmologyError("angle", "Give one angle per redshift.");
    const scale = this.scale(z);
    return scale.map((kpcPerArcsec, i) => {
      if (!Number.isFinite(angle[i]) || angle[i] < 0) throw new CosmologyError("angle", `angle[${i}] must be a finite number ≥ 0 (arcsec).`);
      return kpcPerArcsec * angle[i];
    });
  }

  angularSize(z: Float64Array, size: Float64Array): Float64Array {
    if (size.length !== z.length) throw new CosmologyError("size", "Give one size per redshift.");
    const scale = this.scale(z);
    return scale.map((kpcPerArcsec, i) => {
      if (!Number.isFinite(size[i]) || size[i] < 0) throw new CosmologyError("size", `size[${i}] must be a finite number ≥ 0 (kpc).`);
      if (kpcPerArcsec === 0) throw new CosmologyError("z", `z[${i}] = ${z[i]}: at zero angular-diameter distance no finite angle exists; ask for z > 0.`);
      return size[i] / kpcPerArcsec;
    });
  }

  /** D_A for each z, without the distance modulus (so z = 0 is fine). */
  private distancesWithoutModulus(z: Float64Array): Float64Array {
    checkRedshifts(z);
    const result = new Float64Array(z.length);
    for (let i = 0; i < z.length; i++) {
      this.table.evaluate(Math.log1p(z[i]));
      result[i] = (this.hubbleDistance * this.transverse(this.table.comoving)) / (1 + z[i]);
    }
    return result;
  }

  /**
   * Comoving volume out to z (Hogg 1999, eq. 29), written with χ = √|Ω_k| D_C/D_H:
   * V = π R³ (sinh 2χ − 2χ) open, (4π/3) D_M³ flat, π R³ (2χ − sin 2χ) closed, R = D_H/√|Ω_k|.
   * These equal Hogg's asinh/arcsin forms and stay valid past the equator of a closed space.
   */
  comovingVolume(z: Float64Array, area?: number): Float64Array {
    checkRedshifts(z);
    let fraction = 1;
    if (area !== undefined) {
      if (!(area > 0 && area <= FULL_SKY_DEG2 * (1 + 1e-12))) {
        throw new CosmologyError("area", `area must be between 0 and the whole sky, ${FULL_SKY_DEG2.toFixed(3)} deg².`);
      }
      fraction = Math.min(1, area / FULL_SKY_DEG2);
    }
    const omegaK = this.background.omegaK;
    const k = this.curvatureScale;
    const factor = fraction * Math.PI * this.hubbleDistance ** 3;
    const result = new Float64Array(z.length);
    for (let i = 0; i < z.length; i++) {
      this.table.evaluate(Math.log1p(z[i]));
      const comoving = this.table.comoving;
      if (omegaK === 0) result[i] = (4 / 3) * factor * comoving ** 3;
      else result[i] = (factor / k ** 3) * oddSeriesRemainder(2 * k * comoving, omegaK > 0 ? 1 : -1);
    }
    return result;
  }

  /** dV_C/(dz dΩ) = D_H D_M² / E(z) (Hogg 1999, eq. 28), Mpc³ per sr per unit z. */
  differentialComovingVolume(z: Float64Array): Float64Array {
    checkRedshifts(z);
    const result = new Float64Array(z.length);
    for (let i = 0; i < z.length; i++) {
      const u = Math.log1p(z[i]);
      this.table.evaluate(u);
      const transverse = this.hubbleDistance * this.transverse(this.table.comoving);
      result[i] = (this.hubbleDistance * transverse * transverse) / Math.sqrt(this.background.hubbleSquared(u, 1 + z[i]));
    }
    return result;
  }

  /** Value of an invertible quantity at u = ln(1+z), in Mpc or Gyr. */
  private valueAt(quantity: InvertibleQuantity, u: number): number {
    this.table.evaluate(u);
    switch (quantity) {
      case "lookbackTime":
        return this.hubbleTime * this.table.lookback;
      case "age":
        return this.hubbleTime * this.table.ageAfterEvaluate();
      case "comovingDistance":
        return this.hubbleDistance * this.table.comoving;
      case "luminosityDistance":
        return this.hubbleDistance * this.transverse(this.table.comoving) * Math.exp(u);
      case "angularDiameterDistance":
        return (this.hubbleDistance * this.transverse(this.table.comoving)) / Math.exp(u);
    }
  }

  /**
   * Sign-carrying derivative in u of D_L = e^u |D_M| (direction +1) or D_A = e^{−u} |D_M| (−1), in
   * units of D_H: e^{±u}(d|D_M|/du ± |D_M|), with dD_M/du = C_k(χ) e^u/E (C_k = cosh, 1 or cos).
   */
  private transverseSlope(u: number, direction: 1 | -1): number {
    this.table.evaluate(u);
    const comoving = this.table.comoving;
    const omegaK = this.background.omegaK;
    const k = this.curvatureScale;
    let signed = comoving;
    let cosine = 1;
    if (omegaK > 0) {
      signed = Math.sinh(k * comoving) / k;
      cosine = Math.cosh(k * comoving);
    } else if (omegaK < 0) {
      signed = Math.sin(k * comoving) / k;
      cosine = Math.cos(k * comoving);
    }
    const slope = Math.sign(signed || 1) * cosine * this.table.distanceIntegrand(u);
    return slope + direction * Math.abs(signed);
  }

  /** Interior extrema (in u) of a quantity on [0, TABLE_TOP]; the three time/comoving ones have none. */
  private extrema(quantity: InvertibleQuantity): number[] {
    const cached = this.extremaCache.get(quantity);
    if (cached) return cached;
    const found: number[] = [];
    if (quantity === "luminosityDistance" || quantity === "angularDiameterDistance") {
      const direction = quantity === "luminosityDistance" ? 1 : -1;
      const slope = (u: number) => this.transverseSlope(u, direction);
      let previousU = 0;
      let previous = slope(0);
      for (let u = SEARCH_STEP; previousU < TABLE_TOP; u = Math.min(TABLE_TOP, u + SEARCH_STEP)) {
        const current = slope(u);
        if (current < 0 !== previous < 0) found.push(bisect(slope, previousU, u));
        previousU = u;
        previous = current;
      }
    }
    this.extremaCache.set(quantity, found);
    return found;
  }

  turnaround(): Turnaround | null {
    if (this.turnaroundCache !== undefined) return this.turnaroundCache;
    let best: { u: number; value: number } | null = null;
    for (const u of this.extrema("angularDiameterDistance")) {
      const isMaximum = this.transverseSlope(Math.max(0, u - 1e-6), -1) > 0;
      const value = this.valueAt("angularDiameterDistance", u);
      if (isMaximum && (best === null || value > best.value)) best = { u, value };
    }
    // No maximum, or D_A still higher at the top of the range (e.g. de Sitter, Milne): none exists.
    if (best === null || this.valueAt("angularDiameterDistance", TABLE_TOP) >= best.value) {
      this.turnaroundCache = null;
    } else {
      this.table.evaluate(best.u);
      this.turnaroundCache = {
        z: Math.expm1(best.u),
        angularDiameterDistance: best.value,
        lookbackTime: this.hubbleTime * this.table.lookback,
      };
    }
    return this.turnaroundCache;
  }

  /**
   * Every z in [0, 1e10] at which `quantity` takes `value` (Mpc or Gyr), ascending. Monotone pieces
   * between extrema each hold at most one root, found by bisection in u to the last double.
   */
  redshiftsFor(quantity: InvertibleQuantity, value: number): number[] {
    if (!Number.isFinite(value) || value < 0) return [];
    if (quantity === "age" && this.table.ageIntegral === null) return [];
    const breaks = [0, ...this.extrema(quantity), TABLE_TOP];
    const roots: number[] = [];
    const difference = (u: number) => this.valueAt(quantity, u) - value;
    for (let i = 1; i < breaks.length; i++) {
      const low = difference(breaks[i - 1]);
      const high = difference(breaks[i]);
      if (low === 0) roots.push(breaks[i - 1]);
      else if (high === 0) roots.push(breaks[i]);
      else if (low < 0 !== high < 0) roots.push(bisect(difference, breaks[i - 1], breaks[i]));
    }
    const sorted = roots.map((u) => Math.expm1(u)).sort((a, b) => a - b);
    return sorted.filter((z, i) => i === 0 || z - sorted[i - 1] > 1e-13 * (1 + z));
  }
}

const CACHE_SIZE = 32;
const cache = new Map<string, Engine>();

/**
 * Build (or fetch from a small LRU keyed by parameterHash) the engine for a parameter set.
 * Throws CosmologyError naming the parameter for a model without a big bang or with impossible values.
 */
export function createCosmology(p: CosmologyParameters): Cosmology {
  const parameters = resolveParameters(p);
  const hash = parameterHash(parameters);
  const cached = cache.get(hash);
  if (cached) {
    cache.delete(hash);
    cache.set(hash, cached);
    return cached;
  }
  const background = new Background(parameters);
  const engine = new Engine(Object.freeze({ ...parameters, neutrinoMasses: Object.freeze([...parameters.neutrinoMasses]) as number[] }), background, new IntegralTable(background));
  cache.set(hash, engine);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
  return engine;
}

export { MAX_REDSHIFT };
