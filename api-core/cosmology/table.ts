import type { Background } from "./background";
import { MAX_REDSHIFT } from "./background";
import { antiderivativeCoefficients, chebyshevCoefficients, chebyshevPoints, clenshaw, gaussLegendre, integrate } from "./chebyshev";
import { CosmologyError } from "./errors";

/** Top of the table in u = ln(1+z). */
export const TABLE_TOP = Math.log1p(MAX_REDSHIFT);

const POINTS = 18; // Chebyshev points per segment: the integrand fit has degree 17
const STRIDE = POINTS + 1; // its antiderivative has one more coefficient
const FIRST_WIDTH = 1 / 8;
const REGULAR_WIDTH = 1 / 2;
const MIN_WIDTH = 1 / 4096;
/** Refine until the fitted integrands match the true ones to this relative error (well above rounding noise, ~1e-15) at check points. */
const TARGET_ERROR = 5e-14;
const BUCKET_WIDTH = 1 / 16;

const NODES = chebyshevPoints(POINTS);
/** Check points half-way (in angle) between the Chebyshev points, plus both ends. */
const CHECKS = Float64Array.from({ length: POINTS + 1 }, (_, j) => Math.cos((Math.PI * j) / POINTS));
const AVERAGE_RULE = gaussLegendre(24);
const TAIL_RULE = gaussLegendre(10);

/**
 * The per-cosmology interpolant behind every distance and time. With u = ln(1+z):
 *   lookback time   t_L = t_H ∫₀^u du'/E          (Hogg 1999, eq. 30, with dz = (1+z) du)
 *   comoving dist.  D_C = D_H ∫₀^u e^{u'} du'/E    (Hogg 1999, eq. 15)
 *   age             t   = t_H ∫_u^∞ du'/E
 * The two integrands are smooth in u (their nearest complex singularities, zeros of E², lie ~1 away),
 * so [0, ln(1+1e10)] is cut into segments of width ≤ 1/2 on which each integrand is fitted by a
 * degree-17 Chebyshev series, refined until the fit matches the true integrand to 5e-14 relative at
 * the check points. The fit is integrated exactly, so the relative error of every integral is at most
 * the integrand's (the integrands are positive). On the first segment the series holds the running
 * mean (1/u)∫₀^u, so values stay exact to rounding even at z = 1e-12. Partial sums of whole segments
 * are stored both ways (from 0 upward, from ∞ downward) so that neither t_L at low z nor the age at
 * high z suffers cancellation.
 */
export class IntegralTable {
  readonly starts: Float64Array;
  readonly ends: Float64Array;
  private readonly centres: Float64Array;
  private readonly inverseHalfWidths: Float64Array;
  private readonly timeSeries: Float64Array;
  private readonly distanceSeries: Float64Array;
  /** ∫₀^{start} of each integrand (dimensionless; times t_H or D_H). */
  private readonly timeBelow: Float64Array;
  private readonly distanceBelow: Float64Array;
  /** ∫_{start}^{end} of the time integrand, and ∫_{end}^∞ (null entries for eternal models). */
  private readonly timeWithin: Float64Array;
  private readonly timeAbove: Float64Array | null;
  private readonly buckets: Int32Array;
  /** Largest relative error of the fitted integrands measured at the check points. */
  readonly measuredError: number;
  /** ∫₀^∞ du/E (age today / t_H), or null when it diverges. */
  readonly ageIntegral: number | null;

  // Results of the last `evaluate` call (kept in fields so the hot loop allocates nothing).
  lookback = 0;
  comoving = 0;
  segment = 0;

  constructor(private readonly background: Background) {
    const segments: { start: number; end: number; time: Float64Array; distance: Float64Array; error: number }[] = [];
    const pending: [number, number][] = [[0, FIRST_WIDTH]];
    for (let start = FIRST_WIDTH; start < TABLE_TOP; start += REGULAR_WIDTH) pending.push([start, Math.min(TABLE_TOP, start + REGULAR_WIDTH)]);
    pending.reverse();
    let measured = 0;
    while (pending.length > 0) {
      const [start, end] = pending.pop()!;
      const fit = this.fitSegment(start, end);
      if (fit.error > TARGET_ERROR && end - start > MIN_WIDTH) {
        const middle = (start + end) / 2;
        pending.push([middle, end], [start, middle]);
        continue;
      }
      if (fit.error > 1e-12) {
        throw new CosmologyError(
          "omegaDE",
          "H(z) varies too sharply for this engine (a near-loitering model); move the parameters away from a bounce.",
        );
      }
      measured = Math.max(measured, fit.error);
      segments.push({ start, end, ...fit });
    }
    this.measuredError = measured;

    const count = segments.length;
    this.starts = Float64Array.from(segments, (s) => s.start);
    this.ends = Float64Array.from(segments, (s) => s.end);
    this.centres = Float64Array.from(segments, (s) => (s.start + s.end) / 2);
    this.inverseHalfWidths = Float64Array.from(segments, (s) => 2 / (s.end - s.start));
    this.timeSeries = new Float64Array(count * STRIDE);
    this.distanceSeries = new Float64Array(count * STRIDE);
    segments.forEach((s, i) => {
      this.timeSeries.set(s.time, i * STRIDE);
      this.distanceSeries.set(s.distance, i * STRIDE);
    });

    this.timeWithin = new Float64Array(count);
    const distanceWithin = new Float64Array(count);
    for (let i = 0; i < count; i++) {
      this.timeWithin[i] = this.partial(this.timeSeries, i, this.ends[i]);
      distanceWithin[i] = this.partial(this.distanceSeries, i, this.ends[i]);
    }
    this.timeBelow = new Float64Array(count);
    this.distanceBelow = new Float64Array(count);
    for (let i = 1; i < count; i++) {
      this.timeBelow[i] = this.timeBelow[i - 1] + this.timeWithin[i - 1];
      this.distanceBelow[i] = this.distanceBelow[i - 1] + distanceWithin[i - 1];
    }
    if (background.isEternal) {
      this.timeAbove = null;
      this.ageIntegral = null;
    } else {
      this.timeAbove = new Float64Array(count);
      this.timeAbove[count - 1] = this.ageTail();
      for (let i = count - 2; i >= 0; i--) this.timeAbove[i] = this.timeAbove[i + 1] + this.timeWithin[i + 1];
      this.ageIntegral = this.timeAbove[0] + this.timeWithin[0];
    }

    this.buckets = new Int32Array(Math.ceil(TABLE_TOP / BUCKET_WIDTH) + 1);
    let segment = 0;
    for (let b = 0; b < this.buckets.length; b++) {
      while (segment < count - 1 && this.ends[segment] <= b * BUCKET_WIDTH) segment++;
      this.buckets[b] = segment;
    }
  }

  /** 1/E(u), the lookback-time integrand in u. */
  timeIntegrand(u: number): number {
    return 1 / Math.sqrt(this.background.hubbleSquared(u, Math.exp(u)));
  }

  /** e^u/E(u), the comoving-distance integrand in u. */
  distanceIntegrand(u: number): number {
    const onePlusZ = Math.exp(u);
    return onePlusZ / Math.sqrt(this.background.hubbleSquared(u, onePlusZ));
  }

  /** Index of the segment holding u (0 ≤ u ≤ TABLE_TOP). */
  locate(u: number): number {
    let segment = this.buckets[(u / BUCKET_WIDTH) | 0];
    while (u > this.ends[segment] && segment < this.ends.length - 1) segment++;
    return segment;
  }

  /** Sets `lookback` = ∫₀^u du/E and `comoving` = ∫₀^u e^u du/E (dimensionless), and `segment`. */
  evaluate(u: number): void {
    const segment = this.locate(u);
    const x = (u - this.centres[segment]) * this.inverseHalfWidths[segment];
    const offset = segment * STRIDE;
    const time = this.timeSeries;
    const distance = this.distanceSeries;
    // Both Clenshaw recurrences in one loop.
    let t1 = 0, t2 = 0, d1 = 0, d2 = 0;
    const twoX = 2 * x;
    for (let k = offset + STRIDE - 1; k > offset; k--) {
      const t0 = time[k] + twoX * t1 - t2;
      t2 = t1;
      t1 = t0;
      const d0 = distance[k] + twoX * d1 - d2;
      d2 = d1;
      d1 = d0;
    }
    const timeValue = time[offset] + x * t1 - t2;
    const distanceValue = distance[offset] + x * d1 - d2;
    this.segment = segment;
    if (segment === 0) {
      this.lookback = u * timeValue;
      this.comoving = u * distanceValue;
    } else {
      this.lookback = this.timeBelow[segment] + timeValue;
      this.comoving = this.distanceBelow[segment] + distanceValue;
    }
  }

  /** ∫_u^∞ du/E for the segment found by the last `evaluate(u)`; needs a finite age. */
  ageAfterEvaluate(): number {
    const segment = this.segment;
    const inSegment = segment === 0 ? this.lookback : this.lookback - this.timeBelow[segment];
    return this.timeAbove![segment] + (this.timeWithin[segment] - inSegment);
  }

  /** ∫_{u1}^{u2} e^u du/E without cancellation when u1 ≈ u2 (direct quadrature of short spans). */
  comovingBetween(u1: number, u2: number): number {
    if (u2 - u1 <= FIRST_WIDTH) return integrate((u) => this.distanceIntegrand(u), u1, u2, AVERAGE_RULE);
    this.evaluate(u2);
    const upper = this.comoving;
    this.evaluate(u1);
    return upper - this.comoving;
  }

  /** Partial integral of segment i's fitted integrand from its start to u. */
  private partial(series: Float64Array, i: number, u: number): number {
    const x = (u - this.centres[i]) * this.inverseHalfWidths[i];
    const value = clenshaw(series, i * STRIDE, STRIDE, x);
    return i === 0 ? u * value : value;
  }

  private fitSegment(start: number, end: number): { time: Float64Array; distance: Float64Array; error: number } {
    const centre = (start + end) / 2;
    const halfWidth = (end - start) / 2;
    const averaged = start === 0;
    // On the first segment fit the running mean (1/u)∫₀^u f, elsewhere f itself.
    const target = (f: (u: number) => number) => (u: number) => (averaged ? integrate((t) => f(u * t), 0, 1, AVERAGE_RULE) : f(u));
    const timeTarget = target((u) => this.timeIntegrand(u));
    const distanceTarget = target((u) => this.distanceIntegrand(u));
    const build = (f: (u: number) => number) => {
      const coefficients = chebyshevCoefficients(Array.from(NODES, (x) => f(centre + halfWidth * x)));
      let error = 0;
      for (const x of CHECKS) {
        const exact = f(centre + halfWidth * x);
        error = Math.max(error, Math.abs(clenshaw(coefficients, 0, POINTS, x) / exact - 1));
      }
      if (averaged) {
        const padded = new Float64Array(STRIDE);
        padded.set(coefficients);
        return { series: padded, error };
      }
      return { series: antiderivativeCoefficients(coefficients, halfWidth), error };
    };
    const time = build(timeTarget);
    const distance = build(distanceTarget);
    return { time: time.series, distance: distance.series, error: Math.max(time.error, distance.error) };
  }

  /**
   * ∫_{TABLE_TOP}^∞ du/E. With s = √a = e^{−u/2}: du/E = 2 ds/(s E), smooth at s = 0 for radiation
   * (∝ s³) and matter (∝ s²) domination. Composite Gauss–Legendre on panels halving toward s = 0.
   */
  private ageTail(): number {
    const sTop = Math.exp(-TABLE_TOP / 2);
    const integrand = (s: number) => {
      const u = -2 * Math.log(s);
      const hubbleSquared = this.background.hubbleSquared(u, 1 / (s * s));
      return 2 / (s * Math.sqrt(hubbleSquared));
    };
    let sum = 0;
    let upper = sTop;
    for (let panel = 0; panel < 80; panel++) {
      sum += integrate(integrand, upper / 2, upper, TAIL_RULE);
      upper /= 2;
    }
    return sum;
  }
}
