// Closed-form answers of textbook universes, written from the formulas (not from Comova's output),
// for the tests to check the service against. Each formula names its source.

/** Speed of light, km/s (exact, SI 2019). */
export const C_KM_S = 299_792.458;
/** Astronomical unit, m (exact, IAU 2012 Resolution B2). */
export const AU_M = 149_597_870_700;
/** Parsec, m: 648000/π au (IAU 2015 Resolution B2). */
export const PARSEC_M = (648_000 / Math.PI) * AU_M;
export const MPC_M = 1e6 * PARSEC_M;
/** Julian year, s (IAU: 365.25 d). */
export const JULIAN_YEAR_S = 365.25 * 86_400;
export const GYR_S = 1e9 * JULIAN_YEAR_S;
/** Light year, m: c × Julian year. */
export const LIGHT_YEAR_M = 299_792_458 * JULIAN_YEAR_S;
/** Newtonian constant of gravitation, m³/(kg s²) (CODATA 2018). */
export const G_SI = 6.6743e-11;
/** Square degrees on the whole sky: 4π (180/π)². */
export const WHOLE_SKY_DEG2 = 129_600 / Math.PI;
export const ARCSEC_PER_RADIAN = 648_000 / Math.PI;

export const H0 = 70;
/** Hubble distance c/H0, Mpc (Hogg 1999 eq. 4). */
export const D_H = C_KM_S / H0;
/** Hubble time 1/H0, Gyr (Hogg 1999 eq. 3). */
export const T_H = MPC_M / (H0 * 1000) / GYR_S;

/** Critical density 3H²/(8πG), kg/m³, for H in km/s/Mpc (e.g. Peebles 1993). */
export const criticalDensity = (hubble: number) => (3 * (hubble * 1000 / MPC_M) ** 2) / (8 * Math.PI * G_SI);

/** Einstein–de Sitter (Ωm = 1, no radiation, flat); e.g. Peebles (1993), Hogg (1999) §§5–11. */
export const eds = {
  inline: { h0: H0, omegaM: 1, tcmb: 0 },
  E: (z: number) => (1 + z) ** 1.5,
  comovingDistance: (z: number) => 2 * D_H * (1 - 1 / Math.sqrt(1 + z)),
  angularDiameterDistance: (z: number) => eds.comovingDistance(z) / (1 + z),
  luminosityDistance: (z: number) => eds.comovingDistance(z) * (1 + z),
  lookbackTime: (z: number) => (2 / 3) * T_H * (1 - (1 + z) ** -1.5),
  age: (z: number) => (2 / 3) * T_H * (1 + z) ** -1.5,
  /** Angular-diameter distance peaks where 1/√(1+z) = 2/3: z = 5/4, D_A = (8/27) D_H. */
  turnaround: { z: 1.25, angularDiameterDistance: (8 / 27) * D_H, lookbackTime: (2 / 3) * T_H * (1 - 8 / 27) },
};

/** Milne (empty, open: Ωk = 1): D_C = D_H ln(1+z), D_M = D_H sinh(D_C/D_H) (Hogg 1999 eq. 16). */
export const milne = {
  inline: { h0: H0, omegaM: 0, omegaDE: 0, tcmb: 0 },
  comovingDistance: (z: number) => D_H * Math.log(1 + z),
  transverseComovingDistance: (z: number) => D_H * Math.sinh(Math.log(1 + z)),
  luminosityDistance: (z: number) => D_H * z * (1 + z / 2),
  lookbackTime: (z: number) => (T_H * z) / (1 + z),
  age: (z: number) => T_H / (1 + z),
  /** Hogg (1999) eq. 29 with Ωk = 1, whole sky. */
  comovingVolume: (z: number) => {
    const x = milne.transverseComovingDistance(z) / D_H;
    return ((4 * Math.PI * D_H ** 3) / 2) * (x * Math.sqrt(1 + x * x) - Math.asinh(x));
  },
};

/** Relative difference. */
export const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Asserts every element of `actual` matches `expected(z)` within a relative tolerance. */
export function expectClose(actual: (number | null)[], expected: number[], tolerance = 1e-6): void {
  expected.forEach((value, i) => {
    const got = actual[i];
    if (got === null || !(rel(got, value) <= tolerance)) {
      throw new Error(`index ${i}: got ${got}, expected ${value} (relative tolerance ${tolerance})`);
    }
  });
  if (actual.length !== expected.length) throw new Error(`got ${actual.length} values, expected ${expected.length}`);
}
