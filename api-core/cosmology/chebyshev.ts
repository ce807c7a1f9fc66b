/**
 * Chebyshev series and Gauss–Legendre quadrature: the two numerical tools behind every table.
 * Conventions: f(x) ≈ Σ_{k=0}^{n-1} c_k T_k(x) on x ∈ [−1, 1] (c_0 not halved).
 */

/** Chebyshev points of the first kind, x_j = cos(π (j + ½) / n), j = 0…n−1. */
export function chebyshevPoints(n: number): Float64Array {
  const points = new Float64Array(n);
  for (let j = 0; j < n; j++) points[j] = Math.cos((Math.PI * (j + 0.5)) / n);
  return points;
}

/**
 * Coefficients of the degree n−1 interpolant through values at chebyshevPoints(n)
 * (discrete cosine transform; Press et al., Numerical Recipes, §5.8).
 */
export function chebyshevCoefficients(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const cosines = cosineMatrix(n);
  const coefficients = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    let sum = 0;
    for (let j = 0; j < n; j++) sum += values[j] * cosines[k * n + j];
    coefficients[k] = ((k === 0 ? 1 : 2) / n) * sum;
  }
  return coefficients;
}

const cosineMatrices = new Map<number, Float64Array>();

/** cos(π k (j + ½) / n), cached per n: tables are built often, always with the same n. */
function cosineMatrix(n: number): Float64Array {
  let matrix = cosineMatrices.get(n);
  if (!matrix) {
    matrix = new Float64Array(n * n);
    for (let k = 0; k < n; k++) for (let j = 0; j < n; j++) matrix[k * n + j] = Math.cos((Math.PI * k * (j + 0.5)) / n);
    cosineMatrices.set(n, matrix);
  }
  return matrix;
}

/**
 * Coefficients (length n+1) of P(x) = halfWidth · ∫_{−1}^{x} f, so that P is the integral over the
 * original variable u = centre + halfWidth·x. Uses ∫T_0 = T_1, ∫T_1 = T_2/4,
 * ∫T_k = T_{k+1}/(2(k+1)) − T_{k−1}/(2(k−1)) (Numerical Recipes §5.9).
 */
export function antiderivativeCoefficients(c: ArrayLike<number>, halfWidth: number): Float64Array {
  const n = c.length;
  const at = (k: number) => (k < n ? c[k] : 0);
  const integral = new Float64Array(n + 1);
  integral[1] = at(0) - at(2) / 2;
  for (let k = 2; k <= n; k++) integral[k] = (at(k - 1) - at(k + 1)) / (2 * k);
  let valueAtMinusOne = 0;
  for (let k = 1; k <= n; k++) valueAtMinusOne += k % 2 === 0 ? integral[k] : -integral[k];
  integral[0] = -valueAtMinusOne;
  for (let k = 0; k <= n; k++) integral[k] *= halfWidth;
  return integral;
}

/** Σ c[offset+k] T_k(x), k < count, by Clenshaw's recurrence. */
export function clenshaw(c: Float64Array, offset: number, count: number, x: number): number {
  let b1 = 0;
  let b2 = 0;
  const twoX = 2 * x;
  for (let k = offset + count - 1; k > offset; k--) {
    const b0 = c[k] + twoX * b1 - b2;
    b2 = b1;
    b1 = b0;
  }
  return c[offset] + x * b1 - b2;
}

export interface QuadratureRule {
  nodes: Float64Array;
  weights: Float64Array;
}

/** n-point Gauss–Legendre rule on [−1, 1]: Newton iteration on P_n (Golub–Welsch-free classic, NR §4.6). */
export function gaussLegendre(n: number): QuadratureRule {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      derivative = (n * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / derivative;
      x -= step;
      if (Math.abs(step) < 1e-17) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return { nodes, weights };
}

/** ∫_a^b f by one application of `rule`. */
export function integrate(f: (x: number) => number, a: number, b: number, rule: QuadratureRule): number {
  const centre = (a + b) / 2;
  const halfWidth = (b - a) / 2;
  let sum = 0;
  for (let i = 0; i < rule.nodes.length; i++) sum += rule.weights[i] * f(centre + halfWidth * rule.nodes[i]);
  return sum * halfWidth;
}
