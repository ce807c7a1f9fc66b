import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fermiDiracIntegral, fermiDiracRatio, FERMI_DIRAC_MASSLESS } from "@/api-core/cosmology/neutrinos";

const reference = JSON.parse(readFileSync("tests/fixtures/cosmology/reference.json", "utf8")) as {
  fermiDirac: { y: string; ratio: number }[];
};

describe("F(y)/F(0), F(y) = ∫ x²√(x²+y²)/(eˣ+1) dx", () => {
  it("matches the mpmath 30-digit nested quadrature (make_reference.py) to 1e-12 relative", () => {
    for (const { y, ratio } of reference.fermiDirac) {
      expect(Math.abs(fermiDiracRatio(Number(y)) / ratio - 1), `y = ${y}`).toBeLessThan(1e-12);
    }
  });
  it("F(0) = 7π⁴/120 = (1 − 2⁻³)·3!·ζ(4) (Gradshteyn & Ryzhik 3.411.3)", () => {
    expect(FERMI_DIRAC_MASSLESS).toBeCloseTo(5.682196976983475, 14);
    expect(fermiDiracRatio(0)).toBe(1);
  });
  it("y → 0: 1 + (5/(7π²)) y² from √(x²+y²) ≈ x + y²/(2x) and ∫x/(eˣ+1) = π²/12", () => {
    const y = 1e-3;
    expect(Math.abs(fermiDiracRatio(y) - (1 + (5 / (7 * Math.PI ** 2)) * y * y))).toBeLessThan(1e-13);
  });
  it("y ≫ 1: → y·(3ζ(3)/2)/(7π⁴/120), non-relativistic limit, ∫x²/(eˣ+1) = (3/2)ζ(3) (G&R 3.411.3)", () => {
    const zeta3 = 1.2020569031595942; // Apéry's constant (standard value, from memory)
    const leading = (1.5 * zeta3) / ((7 * Math.PI ** 4) / 120);
    for (const y of [1e4, 1e6]) expect(Math.abs(fermiDiracRatio(y) / (leading * y) - 1)).toBeLessThan(2e-7 * (1e4 / y) ** 2 + 1e-14);
  });
  it("switches branches without a jump: small-y series, table and asymptote agree with direct quadrature at the joins", () => {
    for (const y of [1e-4, 1e3, Math.exp(-5.210340371976184), Math.exp(0.7896596280238163)]) {
      for (const side of [1 - 1e-12, 1 + 1e-12]) {
        const quadrature = fermiDiracIntegral(y * side) / FERMI_DIRAC_MASSLESS;
        expect(Math.abs(fermiDiracRatio(y * side) / quadrature - 1), `y = ${y * side}`).toBeLessThan(1e-13);
      }
    }
  });
});
