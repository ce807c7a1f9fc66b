import { describe, expect, it } from "vitest";
import {
  createCosmology,
  distanceUnitFactor,
  DISTANCE_UNITS,
  parameterHash,
  PRESETS,
  resolveParameters,
  timeUnitFactor,
  TIME_UNITS,
} from "@/api-core/cosmology";

describe("resolveParameters", () => {
  it("fills the documented defaults: tcmb 2.7255 K (Fixsen 2009), nEff 3.046, no masses, w0 −1, wa 0, flat", () => {
    expect(resolveParameters({ h0: 70, omegaM: 0.3 })).toEqual({
      h0: 70, omegaM: 0.3, omegaDE: null, tcmb: 2.7255, nEff: 3.046, neutrinoMasses: [], w0: -1, wa: 0,
    });
  });
  it("sorts masses", () => {
    expect(resolveParameters({ h0: 70, omegaM: 0.3, neutrinoMasses: [0.1, 0.05] }).neutrinoMasses).toEqual([0.05, 0.1]);
  });
});

describe("parameterHash", () => {
  it("is sha256 of the canonical JSON, independent of key order and mass order", () => {
    const a = resolveParameters({ h0: 70, omegaM: 0.3, neutrinoMasses: [0.1, 0.05] });
    const b = resolveParameters({ neutrinoMasses: [0.05, 0.1], omegaM: 0.3, h0: 70 } as never);
    expect(parameterHash(a)).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(parameterHash(a)).toBe(parameterHash(b));
  });
  it("differs when any parameter differs", () => {
    const base = resolveParameters({ h0: 70, omegaM: 0.3 });
    const variants = [{ h0: 70.0000001 }, { omegaM: 0.31 }, { omegaDE: 0.7 }, { tcmb: 0 }, { nEff: 3 }, { neutrinoMasses: [0.06] }, { w0: -0.9 }, { wa: 0.1 }];
    const hashes = new Set([parameterHash(base), ...variants.map((v) => parameterHash({ ...base, ...v }))]);
    expect(hashes.size).toBe(variants.length + 1);
  });
});

describe("presets", () => {
  it("each has slug, title, source, version 1 and valid parameters", () => {
    for (const [slug, preset] of Object.entries(PRESETS)) {
      expect(preset.slug).toBe(slug);
      expect(preset.version).toBe(1);
      expect(preset.source.length).toBeGreaterThan(20);
      expect(resolveParameters(preset.parameters)).toEqual(preset.parameters);
      expect(() => createCosmology(preset.parameters)).not.toThrow();
    }
  });
  it("the textbook preset is exactly flat with Ω_Λ = 0.7", () => {
    const derived = createCosmology(PRESETS.textbook.parameters).derived;
    expect(derived.omegaK).toBe(0);
    expect(derived.omegaDE).toBe(0.7);
  });
  it("omegaDE given as 1 − omegaM (0.3 + 0.7) counts as flat despite rounding", () => {
    expect(createCosmology(resolveParameters({ h0: 70, omegaM: 0.3, omegaDE: 0.7, tcmb: 0 })).derived.omegaK).toBe(0);
  });
});

describe("units (IAU 2012 B2 au, IAU 2015 B2 pc = 648000/π au, Julian year)", () => {
  it("1 Mpc = 3.085677581e22 m (IAU 2015 B2 quotes 1 pc = 3.085 677 581 × 10^16 m; from memory)", () => {
    expect(Math.abs(distanceUnitFactor("m", 70) / 3.085677581e22 - 1)).toBeLessThan(1e-9);
  });
  it("1 Mpc = 3.261563777 Mly (1 pc = 3.261 563 777 ly, Julian-year light year; common practice, from memory)", () => {
    expect(Math.abs(distanceUnitFactor("Mly", 70) / 3.261563777 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(distanceUnitFactor("Gly", 70) / 3.261563777e-3 - 1)).toBeLessThan(1e-9);
  });
  it("kpc, Gpc, Mpc/h; Gyr → Myr, yr, s (1 Gyr = 3.15576e16 s)", () => {
    expect(distanceUnitFactor("kpc", 70)).toBe(1000);
    expect(distanceUnitFactor("Gpc", 70)).toBe(0.001);
    expect(distanceUnitFactor("Mpc/h", 67.66)).toBeCloseTo(0.6766, 15);
    expect(timeUnitFactor("Myr")).toBe(1000);
    expect(timeUnitFactor("yr")).toBe(1e9);
    expect(timeUnitFactor("s")).toBe(3.15576e16);
    expect(DISTANCE_UNITS).toHaveLength(7);
    expect(TIME_UNITS).toHaveLength(4);
  });
});
