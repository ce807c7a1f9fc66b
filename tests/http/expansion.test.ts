import { describe, expect, it } from "vitest";
import { criticalDensity, eds, expectClose } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

const Z = [0, 1, 3, 10];

describe("/api/v1/expansion", () => {
  it("Einstein–de Sitter: H = H0 (1+z)^3/2, Ωm(z) = 1, ρc = 3H²/(8πG) with CODATA 2018 G", async () => {
    const response = await api().get(`/api/v1/expansion?z=${Z.join(",")}&h0=70&omegaM=1&tcmb=0`).set(keyHeader());
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    const { results, units } = response.body;
    expectClose(results.hubbleParameter, Z.map((z) => 70 * eds.E(z)));
    expectClose(results.omegaM, Z.map(() => 1));
    expect(results.omegaDE.every((v: number) => Math.abs(v) < 1e-12)).toBe(true);
    expect(results.omegaR.every((v: number) => v === 0)).toBe(true);
    expect(results.omegaK.every((v: number) => Math.abs(v) < 1e-12)).toBe(true);
    expectClose(results.criticalDensity, Z.map((z) => criticalDensity(70 * eds.E(z))), 1e-5);
    expect(units).toMatchObject({ hubbleParameter: "km/s/Mpc", criticalDensity: "kg/m^3" });
  });

  it("Milne: H = H0 (1+z) and Ωk(z) = 1", async () => {
    const response = await api().post("/api/v1/expansion").set(keyHeader()).send({ z: Z, h0: 70, omegaM: 0, omegaDE: 0, tcmb: 0 });
    expectClose(response.body.results.hubbleParameter, Z.map((z) => 70 * (1 + z)));
    expectClose(response.body.results.omegaK, Z.map(() => 1));
  });

  it("Planck 2018: densities at each z add up to 1 (Ωm + ΩDE + ΩR + Ωk = 1, Friedmann equation)", async () => {
    const response = await api().get(`/api/v1/expansion?z=${Z.join(",")}&cosmology=planck18`).set(keyHeader());
    const r = response.body.results;
    Z.forEach((_, i) => expect(r.omegaM[i] + r.omegaDE[i] + r.omegaR[i] + r.omegaK[i]).toBeCloseTo(1, 10));
    expect(r.hubbleParameter[0]).toBeCloseTo(67.66, 10);
  });
});
