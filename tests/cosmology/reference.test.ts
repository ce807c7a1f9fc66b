import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { createCosmology, resolveParameters, type CosmologyInput } from "@/api-core/cosmology";

/**
 * Against an independent high-precision computation: tests/fixtures/cosmology/make_reference.py
 * (mpmath, 30 digits, tanh-sinh quadrature directly in z, nested quadrature for the Fermi–Dirac
 * integral, constants re-entered from CODATA 2018 / IAU 2015). Tolerance: 1e-10 relative.
 */
interface Row {
  z: string;
  [quantity: string]: number | string;
}
const reference = JSON.parse(readFileSync("tests/fixtures/cosmology/reference.json", "utf8")) as {
  families: Record<string, { inputs: CosmologyInput; ageToday: number; rows: Row[] }>;
};

const DISTANCES = ["comovingDistance", "transverseComovingDistance", "angularDiameterDistance", "luminosityDistance", "lightTravelDistance"] as const;
const TIMES = ["lookbackTime", "age"] as const;

describe("every distance and time within 1e-10 of mpmath, z from 1e-6 to 1100", () => {
  for (const [family, { inputs, ageToday, rows }] of Object.entries(reference.families)) {
    it(family, () => {
      const cosmology = createCosmology(resolveParameters(inputs));
      const z = Float64Array.from(rows, (row) => Number(row.z));
      const computed: Record<string, Float64Array> = { ...cosmology.distances(z), ...cosmology.times(z) };
      computed.hubbleParameter = cosmology.expansion(z).hubbleParameter;
      let worst = 0;
      rows.forEach((row, i) => {
        for (const quantity of [...DISTANCES, ...TIMES, "hubbleParameter"]) {
          const error = Math.abs(computed[quantity][i] / (row[quantity] as number) - 1);
          worst = Math.max(worst, error);
          expect(error, `${quantity} at z = ${row.z}`).toBeLessThan(1e-10);
        }
        // μ is a logarithm: compare absolutely (1e-10 relative in D_L is 2.2e-10 mag).
        expect(Math.abs(computed.distanceModulus[i] - (row.distanceModulus as number))).toBeLessThan(1e-9);
      });
      expect(Math.abs(cosmology.derived.ageToday! / ageToday - 1)).toBeLessThan(1e-10);
      console.log(`${family}: max relative error ${worst.toExponential(2)}`);
    });
  }
});
