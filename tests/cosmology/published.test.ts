import { describe, expect, it } from "vitest";
import { createCosmology, PRESETS } from "@/api-core/cosmology";

const planck18 = createCosmology(PRESETS.planck18.parameters);

describe("Planck 2018 VI (A&A 641, A6, Table 2, TT,TE,EE+lowE+lensing+BAO) — values from memory", () => {
  it("age today 13.787 ± 0.020 Gyr", () => {
    expect(Math.abs(planck18.derived.ageToday! - 13.787)).toBeLessThan(0.02);
  });
  it("D_M to last scattering = r_*/θ_* with r_* = 144.57 Mpc, 100θ_* = 1.04119, z_* = 1089.95 (±0.3%)", () => {
    const published = 144.57 / (1.04119 / 100);
    const { transverseComovingDistance } = planck18.distances(Float64Array.from([1089.95]));
    expect(Math.abs(transverseComovingDistance[0] / published - 1)).toBeLessThan(3e-3);
  });
  it("Ω_Λ = 0.6889 in the same column follows from flatness (±0.0056, the quoted error of Ω_m)", () => {
    expect(Math.abs(planck18.derived.omegaDE - 0.6889)).toBeLessThan(0.0056);
  });
});

describe("Planck 2015 XIII (A&A 594, A13, Table 4, TT,TE,EE+lowP+lensing+ext) — from memory", () => {
  it("age today 13.799 ± 0.021 Gyr", () => {
    const age = createCosmology(PRESETS.planck15.parameters).derived.ageToday!;
    expect(Math.abs(age - 13.799)).toBeLessThan(0.021);
  });
});

describe("WMAP9 (Hinshaw et al. 2013, ApJS 208, 19, Table 4, WMAP+eCMB+BAO+H0) — from memory", () => {
  it("age today 13.772 ± 0.059 Gyr", () => {
    const age = createCosmology(PRESETS.wmap9.parameters).derived.ageToday!;
    expect(Math.abs(age - 13.772)).toBeLessThan(0.059);
  });
});

describe("angular-size turnaround (common practice: ~9.6 Gly light-travel distance, z ≈ 1.6, for Planck-like ΛCDM)", () => {
  it("lies at z in 1.5–1.7 with light-travel distance 9.4–9.8 Gly", () => {
    const turnaround = planck18.turnaround()!;
    expect(turnaround.z).toBeGreaterThan(1.5);
    expect(turnaround.z).toBeLessThan(1.7);
    const lightTravelGly = turnaround.lookbackTime; // Gyr of lookback = Gly of light travel (c × t)
    expect(lightTravelGly).toBeGreaterThan(9.4);
    expect(lightTravelGly).toBeLessThan(9.8);
    // It is a maximum: D_A just below and above is smaller.
    const nearby = planck18.distances(Float64Array.from([turnaround.z * 0.99, turnaround.z * 1.01])).angularDiameterDistance;
    expect(nearby[0]).toBeLessThan(turnaround.angularDiameterDistance);
    expect(nearby[1]).toBeLessThan(turnaround.angularDiameterDistance);
  });
});

describe("constants behind the derived values", () => {
  it("critical density today = 1.878 34(4)e-26 h² kg/m³ (PDG Review 'Astrophysical constants', from memory)", () => {
    const h = PRESETS.planck18.parameters.h0 / 100;
    expect(Math.abs(planck18.derived.criticalDensity / (1.87834e-26 * h * h) - 1)).toBeLessThan(1e-4);
  });
  it("Ω_γ h² = 2.473e-5 for T = 2.7255 K (Fixsen 2009 temperature; value common practice, from memory)", () => {
    const h = PRESETS.planck18.parameters.h0 / 100;
    expect(Math.abs((planck18.derived.omegaGamma * h * h) / 2.473e-5 - 1)).toBeLessThan(1e-3);
  });
  it("Ω_ν h² = Σm/93.14 eV for a non-relativistic relic (common practice, from memory), within 1%", () => {
    const h = PRESETS.planck18.parameters.h0 / 100;
    // Planck's N_eff = 3.046 spreads 3.046/3 over each species, so expect Σm (3.046/3)^(3/4)/93.14 eV... to ~1%.
    const expected = (0.06 / 93.14) * (3.046 / 3) ** 0.75;
    expect(Math.abs((planck18.derived.omegaNuMassive * h * h) / expected - 1)).toBeLessThan(0.01);
  });
});
