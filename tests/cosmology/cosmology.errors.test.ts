import { describe, expect, it } from "vitest";
import { createCosmology, CosmologyError, PRESETS, resolveParameters, type CosmologyInput } from "@/api-core/cosmology";

function parameterOf(run: () => unknown): string | null {
  try {
    run();
    return null;
  } catch (error) {
    expect(error).toBeInstanceOf(CosmologyError);
    expect((error as CosmologyError).message.length).toBeGreaterThan(20);
    return (error as CosmologyError).parameter;
  }
}
const build = (input: CosmologyInput) => () => createCosmology(resolveParameters(input));

describe("rejected parameter sets name the offending parameter", () => {
  const cases: [string, CosmologyInput, string][] = [
    ["h0 = 0", { h0: 0, omegaM: 0.3 }, "h0"],
    ["h0 < 0", { h0: -70, omegaM: 0.3 }, "h0"],
    ["h0 NaN", { h0: Number.NaN, omegaM: 0.3 }, "h0"],
    ["h0 Infinity", { h0: Infinity, omegaM: 0.3 }, "h0"],
    ["h0 a string", { h0: "70" as unknown as number, omegaM: 0.3 }, "h0"],
    ["omegaM < 0", { h0: 70, omegaM: -0.1 }, "omegaM"],
    ["omegaM missing", { h0: 70 } as CosmologyInput, "omegaM"],
    ["omegaDE < 0", { h0: 70, omegaM: 0.3, omegaDE: -0.2 }, "omegaDE"],
    ["tcmb < 0", { h0: 70, omegaM: 0.3, tcmb: -1 }, "tcmb"],
    ["nEff < 0", { h0: 70, omegaM: 0.3, nEff: -1 }, "nEff"],
    ["negative mass", { h0: 70, omegaM: 0.3, neutrinoMasses: [-0.1] }, "neutrinoMasses"],
    ["four masses", { h0: 70, omegaM: 0.3, neutrinoMasses: [0.1, 0.1, 0.1, 0.1] }, "neutrinoMasses"],
    ["NaN mass", { h0: 70, omegaM: 0.3, neutrinoMasses: [Number.NaN] }, "neutrinoMasses"],
    ["neutrinos heavier than omegaM", { h0: 70, omegaM: 0.01, neutrinoMasses: [5] }, "neutrinoMasses"],
    ["w0 NaN", { h0: 70, omegaM: 0.3, w0: Number.NaN }, "w0"],
    ["wa Infinity", { h0: 70, omegaM: 0.3, wa: Infinity }, "wa"],
    ["flat with omegaM > 1", { h0: 70, omegaM: 1.2 }, "omegaM"],
    // Closed, Λ-dominated: E² = 0.1(1+z)³ − 1.1(1+z)² + 2 vanishes near z ≈ 8 (a bounce, no big bang).
    ["bounce", { h0: 70, omegaM: 0.1, omegaDE: 2, tcmb: 0 }, "omegaDE"],
    // Pure Λ with negative curvature: E² = Ω_Λ + Ω_k(1+z)² < 0 for large z.
    ["closed vacuum", { h0: 70, omegaM: 0, omegaDE: 1.5, tcmb: 0 }, "omegaDE"],
    // Loitering limit: Ω_Λ just above the Einstein static value for Ω_m = 0.3 (no radiation).
    ["past loitering", { h0: 70, omegaM: 0.3, omegaDE: 1.8, tcmb: 0 }, "omegaDE"],
  ];
  for (const [name, input, parameter] of cases) {
    it(`${name} → ${parameter}`, () => expect(parameterOf(build(input))).toBe(parameter));
  }
  it("a closed but healthy model is accepted (Ω_m = 0.3, Ω_Λ = 1.0)", () => {
    expect(parameterOf(build({ h0: 70, omegaM: 0.3, omegaDE: 1.0, tcmb: 0 }))).toBeNull();
  });
});

describe("redshifts are validated at the engine edge; answers never hold NaN or Infinity", () => {
  const cosmology = createCosmology(PRESETS.planck18.parameters);
  it("negative, NaN, infinite or too large z → parameter z", () => {
    for (const bad of [-1e-9, Number.NaN, Infinity, -Infinity, 1e11]) {
      expect(parameterOf(() => cosmology.times(Float64Array.from([1, bad])))).toBe("z");
      expect(parameterOf(() => cosmology.distances(Float64Array.from([bad])))).toBe("z");
    }
  });
  it("z = 0 has no distance modulus (−∞) → parameter z; other quantities are fine at z = 0", () => {
    expect(parameterOf(() => cosmology.distances(Float64Array.from([0])))).toBe("z");
    expect(cosmology.times(Float64Array.from([0])).lookbackTime[0]).toBe(0);
    expect(cosmology.scale(Float64Array.from([0]))[0]).toBe(0);
  });
  it("zSource below z → parameter zSource", () => {
    expect(parameterOf(() => cosmology.angularDiameterDistanceBetween(Float64Array.from([2]), Float64Array.from([1])))).toBe("zSource");
  });
  it("every output is finite over z ∈ [1e-12, 1e10], for several model families", () => {
    const z = Float64Array.from({ length: 400 }, (_, i) => 10 ** (-12 + (22 * i) / 399));
    const families: CosmologyInput[] = [
      { h0: 67.66, omegaM: 0.3111, neutrinoMasses: [0.06] },
      { h0: 70, omegaM: 0.3, omegaDE: 0.5 },
      { h0: 70, omegaM: 0.4, omegaDE: 0.8 },
      { h0: 70, omegaM: 0.3, w0: -0.5, wa: 3 },
      { h0: 70, omegaM: 0.3, w0: -3, wa: -3 },
      { h0: 10000, omegaM: 100, omegaDE: 50, tcmb: 100, nEff: 30, neutrinoMasses: [100] },
      { h0: 0.01, omegaM: 2, omegaDE: 0, tcmb: 0 },
      { h0: 10000, omegaM: 0, omegaDE: 0, tcmb: 0 },
      { h0: 70, omegaM: 0, tcmb: 0 },
    ];
    for (const input of families) {
      const c = createCosmology(resolveParameters(input));
      const arrays: ArrayLike<number>[] = [
        ...Object.values(c.distances(z)),
        ...Object.values(c.expansion(z)),
        c.scale(z),
        c.comovingVolume(z),
        c.comovingVolume(z, 100),
        c.differentialComovingVolume(z),
        c.angularDiameterDistanceBetween(z.map((v) => v / 2), z),
      ];
      if (c.derived.ageToday !== null) arrays.push(...Object.values(c.times(z)));
      for (const values of arrays) for (const value of Array.from(values)) expect(Number.isFinite(value), JSON.stringify(input)).toBe(true);
      for (const value of Object.values(c.derived)) expect(value === null || Number.isFinite(value)).toBe(true);
    }
  });
});
