// The combined pass must give exactly what the separately tested distances() and times() give
// (those are checked against the mpmath reference and closed forms in reference.test.ts and
// closed-forms.test.ts); this guards the shared loop against a mix-up of columns.
import { describe, expect, it } from "vitest";
import { CosmologyError, createCosmology, PRESETS, resolveParameters } from "@/api-core/cosmology";

const z = Float64Array.from([3.2, 1e-6, 0.5, 1100, 0.5, 7]);

describe("distancesAndTimes", () => {
  it.each([
    ["planck18", PRESETS.planck18.parameters],
    ["open, w0wa", resolveParameters({ h0: 70, omegaM: 0.3, omegaDE: 0.5, w0: -0.9, wa: 0.2 })],
    ["closed", resolveParameters({ h0: 70, omegaM: 0.4, omegaDE: 0.8 })],
  ])("%s: every column equals the separate distances() and times() results", (_, parameters) => {
    const cosmology = createCosmology(parameters);
    const combined = cosmology.distancesAndTimes(z);
    const expected = { ...cosmology.distances(z), ...cosmology.times(z) };
    expect(Object.keys(combined).sort()).toEqual(Object.keys(expected).sort());
    for (const [name, column] of Object.entries(expected)) expect(Array.from(combined[name as keyof typeof combined])).toEqual(Array.from(column));
  });

  it("refuses a model without a finite age, naming omegaM, like times()", () => {
    const deSitter = createCosmology(resolveParameters({ h0: 70, omegaM: 0, omegaDE: 1, tcmb: 0 }));
    expect(() => deSitter.distancesAndTimes(z)).toThrow(CosmologyError);
  });
});
