import { describe, expect, it } from "vitest";
import { D_H, WHOLE_SKY_DEG2, eds, expectClose, milne } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

/** Flat space: V_C = (4π/3) D_C³ over the whole sky (Hogg 1999 eq. 29, Ωk = 0). */
const edsVolume = (z: number) => ((4 * Math.PI) / 3) * eds.comovingDistance(z) ** 3;
/** dV_C/dz/dΩ = D_H (1+z)² D_A² / E(z) (Hogg 1999 eq. 28). */
const edsDifferential = (z: number) => (D_H * (1 + z) ** 2 * eds.angularDiameterDistance(z) ** 2) / eds.E(z);

describe("/api/v1/volumes", () => {
  it("Einstein–de Sitter whole sky: V_C = (4π/3) D_C³ and dV/dz/dΩ = D_H (1+z)² D_A²/E(z) (Hogg 1999 eqs. 28–29)", async () => {
    const zMax = [0.5, 1, 3];
    const response = await api().post("/api/v1/volumes").set(keyHeader()).send({ zMax, ...eds.inline });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    const { results, units, area } = response.body;
    expect(results.zMin).toEqual([0, 0, 0]);
    expectClose(results.comovingVolume, zMax.map(edsVolume));
    expectClose(results.differentialComovingVolume, zMax.map(edsDifferential));
    expect(area).toBeCloseTo(WHOLE_SKY_DEG2, 9);
    expect(units).toMatchObject({ volume: "Mpc^3", differentialComovingVolume: "Mpc^3/sr" });
  });

  it("shells zMin–zMax over an area: (V(zMax) − V(zMin)) × area / whole sky, in Gpc³", async () => {
    const response = await api().get("/api/v1/volumes?zMin=0.5&zMax=1,2&area=1000&h0=70&omegaM=1&tcmb=0&distanceUnit=Gpc").set(keyHeader());
    expect(response.status).toBe(200);
    const shell = (z: number) => ((edsVolume(z) - edsVolume(0.5)) * 1000) / WHOLE_SKY_DEG2 / 1e9;
    expectClose(response.body.results.comovingVolume, [1, 2].map(shell));
    expectClose(response.body.results.differentialComovingVolume, [1, 2].map((z) => edsDifferential(z) / 1e9));
    expect(response.body.units.volume).toBe("Gpc^3");
  });

  it("Milne (Ωk = 1): V_C = (4π D_H³ / 2Ωk)[D_M/D_H √(1 + Ωk D_M²/D_H²) − asinh(√Ωk D_M/D_H)/√Ωk] (Hogg 1999 eq. 29)", async () => {
    const zMax = [0.5, 2];
    const response = await api().post("/api/v1/volumes").set(keyHeader()).send({ zMax, ...milne.inline });
    expectClose(response.body.results.comovingVolume, zMax.map(milne.comovingVolume));
  });

  it("zMin above zMax and an area beyond the sky are refused (422)", async () => {
    for (const query of ["zMin=2&zMax=1", "zMax=1&area=50000"]) {
      const response = await api().get(`/api/v1/volumes?${query}&cosmology=planck18`).set(keyHeader());
      expect(response.status).toBe(422);
      expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
    }
  });
});
