import { chebyshevCoefficients, chebyshevPoints, clenshaw, gaussLegendre, integrate } from "./chebyshev";

/**
 * Energy density of one massive neutrino species relative to its massless value, F(y)/F(0), with
 *   F(y) = ∫₀^∞ x² √(x² + y²) / (eˣ + 1) dx,   y = m c² / (k_B T_ν),
 * the exact Fermi–Dirac integral for a relic that decoupled while relativistic (e.g. Weinberg 2008,
 * "Cosmology", §3.1; Komatsu et al. 2011, ApJS 192, 18, eq. 26 quote the same integral before fitting it).
 */

/** F(0) = (7/8)·Γ(4)·ζ(4) = 7π⁴/120: the Fermi–Dirac integral ∫x³/(eˣ+1) = (1 − 2⁻³) 3! ζ(4). */
export const FERMI_DIRAC_MASSLESS = (7 * Math.PI ** 4) / 120;

// Riemann ζ at odd arguments (standard values, from memory; the test compares the asymptote with mpmath).
const ZETA_3 = 1.2020569031595942;
const ZETA_5 = 1.0369277551433699;
const ZETA_7 = 1.0083492773819228;
const ZETA_9 = 1.0020083928260822;

/** ∫₀^∞ xⁿ/(eˣ+1) dx = (1 − 2⁻ⁿ) n! ζ(n+1) (Gradshteyn & Ryzhik 3.411.3). */
const fermiMoment = (n: number, factorial: number, zeta: number) => (1 - 2 ** -n) * factorial * zeta;
const MOMENT_2 = fermiMoment(2, 2, ZETA_3); // = 3ζ(3)/2
const MOMENT_4 = fermiMoment(4, 24, ZETA_5);
const MOMENT_6 = fermiMoment(6, 720, ZETA_7);
const MOMENT_8 = fermiMoment(8, 40320, ZETA_9);

/** Below this y: F ≈ F(0) + (π²/24) y² (next term O(y⁴ ln y) < 1e-16 relative). */
const SMALL_Y = 1e-4;
/** Above this y: F ≈ y (M2 + M4/(2y²) − M6/(8y⁴) + M8/(16y⁶)) from √(x²+y²) = y √(1 + x²/y²); next term < 1e-24. */
const LARGE_Y = 1e3;

const PANEL_RULE = gaussLegendre(16);

/**
 * F(y) by composite 16-point Gauss–Legendre: panels that double in width around x = y (the branch
 * points of √(x²+y²) sit at ±iy) and then width-2 panels to x = 64 (poles of the Fermi factor at
 * ±iπ; the tail beyond 64 is below 1e-22 relative). Accurate to ~1e-15; used to build the table.
 */
export function fermiDiracIntegral(y: number): number {
  const integrand = (x: number) => (x * x * Math.sqrt(x * x + y * y)) / (Math.exp(x) + 1);
  const breaks = [0];
  let edge = Math.min(y, 1) / 4;
  while (edge < 1) {
    breaks.push(edge);
    edge *= 2;
  }
  for (let x = 1; x <= 64; x += 2) breaks.push(x);
  let sum = 0;
  for (let i = 1; i < breaks.length; i++) sum += integrate(integrand, breaks[i - 1], breaks[i], PANEL_RULE);
  return sum;
}

const LOG_MIN = Math.log(SMALL_Y);
const LOG_MAX = Math.log(LARGE_Y);
const SEGMENT_WIDTH = 1; // in ln y; singularities at Im(ln y) = ±π/2 make degree 23 exact to ~1e-18
const SEGMENT_COUNT = Math.ceil((LOG_MAX - LOG_MIN) / SEGMENT_WIDTH);
const POINTS = 24;

let table: Float64Array | null = null;

/** Chebyshev table of ln-y segments, built once on first use (~5 ms). */
function ratioTable(): Float64Array {
  if (table) return table;
  const points = chebyshevPoints(POINTS);
  const coefficients = new Float64Array(SEGMENT_COUNT * POINTS);
  const values = new Float64Array(POINTS);
  for (let s = 0; s < SEGMENT_COUNT; s++) {
    const start = LOG_MIN + s * SEGMENT_WIDTH;
    for (let j = 0; j < POINTS; j++) {
      const logY = start + (SEGMENT_WIDTH * (points[j] + 1)) / 2;
      values[j] = fermiDiracIntegral(Math.exp(logY)) / FERMI_DIRAC_MASSLESS;
    }
    coefficients.set(chebyshevCoefficients(values), s * POINTS);
  }
  table = coefficients;
  return table;
}

/** F(y)/F(0): 1 for a relativistic species, → y·(3ζ(3)/2)/(7π⁴/120) ≈ 0.3173 y when non-relativistic. */
export function fermiDiracRatio(y: number): number {
  if (y < SMALL_Y) return 1 + ((Math.PI * Math.PI) / 24 / FERMI_DIRAC_MASSLESS) * y * y;
  if (y > LARGE_Y) {
    const inverseSquare = 1 / (y * y);
    const series = MOMENT_2 + inverseSquare * (MOMENT_4 / 2 + inverseSquare * (-MOMENT_6 / 8 + inverseSquare * (MOMENT_8 / 16)));
    return (y * series) / FERMI_DIRAC_MASSLESS;
  }
  const coefficients = ratioTable();
  const position = (Math.log(y) - LOG_MIN) / SEGMENT_WIDTH;
  const segment = Math.min(SEGMENT_COUNT - 1, Math.floor(position));
  return clenshaw(coefficients, segment * POINTS, POINTS, 2 * (position - segment) - 1);
}
