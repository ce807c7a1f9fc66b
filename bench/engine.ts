// Engine benchmark: `npm run bench`. Prints ns per redshift for all distances + lookback time/age.
// No assertions; numbers depend on the machine.
import { createCosmology, PRESETS, resolveParameters, type CosmologyInput, type CosmologyParameters } from "../api-core/cosmology";
import { Background } from "../api-core/cosmology/background";
import { gaussLegendre } from "../api-core/cosmology/chebyshev";

const families: [string, CosmologyInput][] = [
  ["flat, no radiation", { h0: 70, omegaM: 0.3, tcmb: 0 }],
  ["flat, radiation", { h0: 70, omegaM: 0.3 }],
  ["curved (open)", { h0: 70, omegaM: 0.3, omegaDE: 0.5 }],
  ["w0wa", { h0: 70, omegaM: 0.3, w0: -0.9, wa: 0.2 }],
  ["massive ν (planck18)", PRESETS.planck18.parameters],
];

function randomRedshifts(n: number, seed = 1): Float64Array {
  let state = seed;
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    state = (state * 1103515245 + 12345) % 2147483648; // LCG: reproducible input
    z[i] = (10 * (state + 1)) / 2147483649; // (0, 10]
  }
  return z;
}

let sink = 0;
function run(parameters: CosmologyParameters, z: Float64Array): void {
  const cosmology = createCosmology(parameters);
  const result = cosmology.distancesAndTimes(z);
  sink += result.distanceModulus[0] + result.lookbackTime[z.length - 1];
}

/** Best of `repeats` timings, ns per redshift. */
function time(repeats: number, n: number, body: () => void): number {
  let best = Infinity;
  for (let r = 0; r < repeats; r++) {
    const start = process.hrtime.bigint();
    body();
    best = Math.min(best, Number(process.hrtime.bigint() - start));
  }
  return best / n;
}

/** Baseline: each redshift integrated on its own by 64-point Gauss–Legendre in u = ln(1+z). */
function baseline(parameters: CosmologyParameters, z: Float64Array): void {
  const background = new Background(parameters);
  const rule = gaussLegendre(64);
  const out = new Float64Array(z.length);
  for (let i = 0; i < z.length; i++) {
    const u = Math.log1p(z[i]);
    let comoving = 0;
    let lookback = 0;
    for (let k = 0; k < rule.nodes.length; k++) {
      const x = (u / 2) * (1 + rule.nodes[k]);
      const onePlusZ = Math.exp(x);
      const inverseE = 1 / Math.sqrt(background.hubbleSquared(x, onePlusZ));
      comoving += rule.weights[k] * onePlusZ * inverseE;
      lookback += rule.weights[k] * inverseE;
    }
    out[i] = comoving * (u / 2) + lookback;
  }
  sink += out[0];
}

const million = randomRedshifts(1_000_000);
const sorted = Float64Array.from(million).sort();
const rows: string[][] = [["family", "shuffled 1e6 (ns/z)", "sorted 1e6 (ns/z)", "baseline (ns/z)", "speed-up"]];
for (const [name, input] of families) {
  const parameters = resolveParameters(input);
  run(parameters, million); // warm up (JIT, table)
  const shuffled = time(5, million.length, () => run(parameters, million));
  const ordered = time(5, sorted.length, () => run(parameters, sorted));
  const sample = million.subarray(0, 20_000);
  baseline(parameters, sample);
  const plain = time(3, sample.length, () => baseline(parameters, sample));
  rows.push([name, shuffled.toFixed(0), ordered.toFixed(0), plain.toFixed(0), `${(plain / shuffled).toFixed(0)}×`]);
}

// Fixed costs: a fresh cosmology each time (h0 nudged so the LRU cache misses), planck18.
const sizes: [string, number][] = [["1", 1], ["1e3", 1000], ["1e6", 1_000_000]];
let nudge = 0;
const fresh = () => ({ ...PRESETS.planck18.parameters, h0: 67.66 + 1e-9 * ++nudge });
const fixedRows: string[][] = [["planck18, fresh cosmology", "ns/z (incl. construction)", "total (ms)"]];
for (const [label, n] of sizes) {
  const z = million.subarray(0, n);
  const perZ = time(n === 1 ? 20 : 5, n, () => run(fresh(), z));
  fixedRows.push([label + " redshifts", perZ.toFixed(0), ((perZ * n) / 1e6).toFixed(3)]);
}
const construction = time(20, 1, () => createCosmology(fresh())) / 1e6;

function print(table: string[][]): void {
  const widths = table[0].map((_, c) => Math.max(...table.map((row) => row[c].length)));
  for (const [r, row] of table.entries()) {
    console.log("| " + row.map((cell, c) => cell.padEnd(widths[c])).join(" | ") + " |");
    if (r === 0) console.log("|" + widths.map((w) => "-".repeat(w + 2)).join("|") + "|");
  }
  console.log();
}
console.log("All distances (6 columns) + lookback time and age, z uniform in (0, 10], best of 5.\n");
print(rows);
print(fixedRows);
console.log(`cosmology construction (planck18, cache miss): ${construction.toFixed(2)} ms`);
console.log(`peak RSS: ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB (1e6 redshifts: 8 output arrays of 8 MB)`);
if (Number.isNaN(sink)) console.log("unreachable");
