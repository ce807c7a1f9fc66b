import { describe, expect, it } from "vitest";
import { D_H, T_H, LIGHT_YEAR_M, MPC_M, PARSEC_M, eds, expectClose, milne, rel } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

const Z = [0.1, 0.5, 1, 2, 5];

async function post(body: object) {
  const response = await api().post("/api/v1/distances").set(keyHeader()).send(body);
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return response.body;
}

describe("/api/v1/distances — Einstein–de Sitter (h0 = 70, omegaM = 1, tcmb = 0)", () => {
  it("POST: D_C = 2c/H0 (1 − 1/√(1+z)), D_M = D_C (flat), D_A = D_C/(1+z), D_L = (1+z) D_C (Hogg 1999 eqs. 15–21)", async () => {
    const { results, cosmology, units } = await post({ z: Z, ...eds.inline });
    expect(results.z).toEqual(Z);
    expectClose(results.comovingDistance, Z.map(eds.comovingDistance));
    expectClose(results.transverseComovingDistance, Z.map(eds.comovingDistance));
    expectClose(results.angularDiameterDistance, Z.map(eds.angularDiameterDistance));
    expectClose(results.luminosityDistance, Z.map(eds.luminosityDistance));
    // Distance modulus 5 log10(D_L / 10 pc) (Hogg 1999 eq. 25).
    expectClose(results.distanceModulus, Z.map((z) => 5 * Math.log10((eds.luminosityDistance(z) * 1e6) / 10)));
    // Light-travel distance = c × lookback time, t_L = (2/3) t_H (1 − (1+z)^−3/2) (Hogg 1999 eq. 30 for EdS).
    // c × t_H = D_H, so the light-travel distance is D_H t_L / t_H.
    expectClose(results.lightTravelDistance, Z.map((z) => (D_H * eds.lookbackTime(z)) / T_H));
    expect(cosmology).toMatchObject({ ref: null, parameters: { h0: 70, omegaM: 1, omegaDE: null, tcmb: 0, w0: -1, wa: 0 } });
    expect(cosmology.hash).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(cosmology.derived.omegaK).toBeCloseTo(0, 12);
    expect(rel(cosmology.derived.hubbleDistance, D_H)).toBeLessThan(1e-9);
    expect(units).toMatchObject({ distance: "Mpc", time: "Gyr", distanceModulus: "mag" });
  });

  it("GET with comma-separated lists answers the same as POST", async () => {
    const get = await api().get(`/api/v1/distances?z=${Z.join(",")}&h0=70&omegaM=1&tcmb=0`).set(keyHeader());
    expect(get.status).toBe(200);
    const posted = await post({ z: Z, ...eds.inline });
    expect(get.body.results).toEqual(posted.results);
    expect(get.body.cosmology.hash).toBe(posted.cosmology.hash);
  });

  it("zSource: D_A12 = (D_M2 − D_M1)/(1+z2) in a flat universe (Hogg 1999 eq. 19)", async () => {
    const z = [0.2, 0.5, 1];
    const { results } = await post({ z, zSource: [2], ...eds.inline });
    expect(results.zSource).toEqual([2, 2, 2]);
    expectClose(results.angularDiameterDistanceToSource, z.map((z1) => (eds.comovingDistance(2) - eds.comovingDistance(z1)) / 3));
  });

  it("distanceModulus is null at z = 0 (D_L = 0), never NaN", async () => {
    const { results } = await post({ z: [0, 1], ...eds.inline });
    expect(results.comovingDistance[0]).toBe(0);
    expect(results.distanceModulus[0]).toBeNull();
  });
});

describe("/api/v1/distances — Milne (omegaM = 0, omegaDE = 0: open, Ωk = 1)", () => {
  it("D_C = D_H ln(1+z), D_M = D_H sinh(ln(1+z)), D_L = D_H z (1 + z/2) (Hogg 1999 eq. 16)", async () => {
    const { results, cosmology } = await post({ z: Z, ...milne.inline });
    expectClose(results.comovingDistance, Z.map(milne.comovingDistance));
    expectClose(results.transverseComovingDistance, Z.map(milne.transverseComovingDistance));
    expectClose(results.luminosityDistance, Z.map(milne.luminosityDistance));
    expect(cosmology.derived.omegaK).toBeCloseTo(1, 12);
  });
});

describe("/api/v1/distances — units", () => {
  it.each([
    ["kpc", 1e3],
    ["Gpc", 1e-3],
    ["m", MPC_M],
    ["Mly", MPC_M / (1e6 * LIGHT_YEAR_M)], // 1 pc = 648000/π au (IAU 2015) ≈ 3.2616 ly
    ["Gly", MPC_M / (1e9 * LIGHT_YEAR_M)],
    ["Mpc/h", 0.7], // h = H0/100 = 0.7: a distance in h⁻¹ Mpc is the Mpc value times h
  ])("distanceUnit=%s scales every distance by the unit factor and is echoed", async (unit, factor) => {
    const { results, units } = await post({ z: [1, 2], ...eds.inline, distanceUnit: unit });
    expect(units.distance).toBe(unit);
    expectClose(results.luminosityDistance, [1, 2].map((z) => eds.luminosityDistance(z) * factor));
    // The distance modulus stays in magnitudes.
    expectClose(results.distanceModulus, [1, 2].map((z) => 5 * Math.log10((eds.luminosityDistance(z) * 1e6) / 10)));
  });

  it("1 Mpc in light years matches the IAU parsec (3.26156 ly per pc to 6 figures)", () => {
    expect(PARSEC_M / LIGHT_YEAR_M).toBeCloseTo(3.26156, 5);
  });
});

describe("/api/v1/distances — Planck 2018 preset", () => {
  it("answers with ref planck18@1 and obeys Hogg's relations D_L = (1+z)² D_A and D_M = D_C (flat)", async () => {
    const { results, cosmology } = await post({ z: Z, cosmology: "planck18" });
    expect(cosmology.ref).toBe("planck18@1");
    Z.forEach((z, i) => {
      expect(rel(results.luminosityDistance[i], (1 + z) ** 2 * results.angularDiameterDistance[i])).toBeLessThan(1e-12);
      expect(rel(results.transverseComovingDistance[i], results.comovingDistance[i])).toBeLessThan(1e-9);
    });
  });

  it("inline parameters equal to the preset give the same hash (same parameters → same hash)", async () => {
    const named = await post({ z: [1], cosmology: "planck18" });
    const inline = await post({ z: [1], h0: 67.66, omegaM: 0.3111, tcmb: 2.7255, nEff: 3.046, neutrinoMasses: [0.06] });
    expect(inline.cosmology.parameters).toEqual(named.cosmology.parameters);
    expect(inline.cosmology.hash).toBe(named.cosmology.hash);
    expect(inline.cosmology.ref).toBeNull();
    expect(inline.results.comovingDistance).toEqual(named.results.comovingDistance);
  });

  it("reports the time it spent in Server-Timing", async () => {
    const response = await api().get("/api/v1/distances?z=1&cosmology=planck18").set(keyHeader());
    expect(response.headers["server-timing"]).toMatch(/^app;dur=\d+(\.\d+)?$/);
  });
});
