import { describe, expect, it } from "vitest";
import { createCosmology, PRESETS, resolveParameters, type InvertibleQuantity } from "@/api-core/cosmology";

const models = {
  planck18: PRESETS.planck18.parameters,
  textbook: PRESETS.textbook.parameters,
  open: resolveParameters({ h0: 70, omegaM: 0.3, omegaDE: 0.5 }),
  closed: resolveParameters({ h0: 70, omegaM: 0.4, omegaDE: 0.8 }),
  w0wa: resolveParameters({ h0: 70, omegaM: 0.3, w0: -0.9, wa: 0.2 }),
};
const REDSHIFTS = [1e-6, 1e-3, 0.1, 0.7, 1.3, 3, 10, 100, 1100];

describe("inverses: z from a value round-trips to 1e-10 in z (relative to 1+z)", () => {
  for (const [name, parameters] of Object.entries(models)) {
    const cosmology = createCosmology(parameters);
    const z = Float64Array.from(REDSHIFTS);
    const d = cosmology.distances(z);
    const t = cosmology.times(z);
    const values: Record<InvertibleQuantity, Float64Array> = {
      lookbackTime: t.lookbackTime,
      age: t.age,
      comovingDistance: d.comovingDistance,
      luminosityDistance: d.luminosityDistance,
      angularDiameterDistance: d.angularDiameterDistance,
    };
    for (const quantity of Object.keys(values) as InvertibleQuantity[]) {
      it(`${name}: ${quantity}`, () => {
        REDSHIFTS.forEach((zi, i) => {
          const roots = cosmology.redshiftsFor(quantity, values[quantity][i]);
          const closest = Math.min(...roots.map((r) => Math.abs(r - zi)));
          expect(closest, `z = ${zi}, roots ${roots}`).toBeLessThan(1e-10 * (1 + zi));
          expect(roots).toEqual([...roots].sort((a, b) => a - b));
        });
      });
    }
  }
});

describe("angular-diameter distance has two roots below its maximum, none above", () => {
  const cosmology = createCosmology(PRESETS.planck18.parameters);
  const turnaround = cosmology.turnaround()!;
  it("two ordered roots, one on each side of the turnaround", () => {
    const roots = cosmology.redshiftsFor("angularDiameterDistance", 0.9 * turnaround.angularDiameterDistance);
    expect(roots).toHaveLength(2);
    expect(roots[0]).toBeLessThan(turnaround.z);
    expect(roots[1]).toBeGreaterThan(turnaround.z);
    const back = cosmology.distances(Float64Array.from(roots)).angularDiameterDistance;
    for (const value of back) expect(Math.abs(value / (0.9 * turnaround.angularDiameterDistance) - 1)).toBeLessThan(1e-12);
  });
  it("none above the maximum; out-of-range values give an empty list", () => {
    expect(cosmology.redshiftsFor("angularDiameterDistance", 1.001 * turnaround.angularDiameterDistance)).toEqual([]);
    expect(cosmology.redshiftsFor("lookbackTime", cosmology.derived.ageToday! * 1.01)).toEqual([]);
    expect(cosmology.redshiftsFor("age", cosmology.derived.ageToday! * 1.01)).toEqual([]);
    expect(cosmology.redshiftsFor("comovingDistance", -1)).toEqual([]);
    expect(cosmology.redshiftsFor("comovingDistance", Number.NaN)).toEqual([]);
    expect(cosmology.redshiftsFor("luminosityDistance", Infinity)).toEqual([]);
  });
  it("value 0 gives z = 0", () => {
    expect(cosmology.redshiftsFor("comovingDistance", 0)).toEqual([0]);
    expect(cosmology.redshiftsFor("angularDiameterDistance", 0)).toEqual([0]);
  });
});
