import { describe, expect, it } from "vitest";
import { ARCSEC_PER_RADIAN, eds, expectClose, milne, rel } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

const Z = [0.5, 1, 2];
/** kpc per arcsec: D_A (Mpc) × 1000 kpc/Mpc / (648000/π arcsec per radian). */
const edsScale = (z: number) => (eds.angularDiameterDistance(z) * 1000) / ARCSEC_PER_RADIAN;

describe("/api/v1/angular-size", () => {
  it("Einstein–de Sitter: scale = D_A/206265″ per kpc, and the turnaround at z = 5/4 with D_A = (8/27) c/H0", async () => {
    const response = await api().get(`/api/v1/angular-size?z=${Z.join(",")}&h0=70&omegaM=1&tcmb=0`).set(keyHeader());
    expect(response.status).toBe(200);
    const { results, turnaround, units } = response.body;
    expectClose(results.scale, Z.map(edsScale));
    expect(results.angularSize).toBeUndefined();
    expect(rel(turnaround.z, eds.turnaround.z)).toBeLessThan(1e-6);
    expect(rel(turnaround.angularDiameterDistance, eds.turnaround.angularDiameterDistance)).toBeLessThan(1e-6);
    expect(rel(turnaround.lookbackTime, eds.turnaround.lookbackTime)).toBeLessThan(1e-6);
    expect(units).toMatchObject({ scale: "kpc/arcsec", size: "kpc", angle: "arcsec" });
  });

  it("size (kpc) → angularSize = size/scale; angle (arcsec) → physicalSize = angle × scale", async () => {
    const bySize = await api().post("/api/v1/angular-size").set(keyHeader()).send({ z: Z, size: [10], ...eds.inline });
    expect(bySize.status).toBe(200);
    expectClose(bySize.body.results.angularSize, Z.map((z) => 10 / edsScale(z)));
    const byAngle = await api().post("/api/v1/angular-size").set(keyHeader()).send({ z: Z, angle: [1, 2, 3], ...eds.inline });
    expectClose(byAngle.body.results.physicalSize, Z.map((z, i) => (i + 1) * edsScale(z)));
  });

  it("turnaround is in the requested units (Gpc, Myr)", async () => {
    const response = await api().get("/api/v1/angular-size?z=1&h0=70&omegaM=1&tcmb=0&distanceUnit=Gpc&timeUnit=Myr").set(keyHeader());
    expect(rel(response.body.turnaround.angularDiameterDistance, eds.turnaround.angularDiameterDistance / 1000)).toBeLessThan(1e-6);
    expect(rel(response.body.turnaround.lookbackTime, eds.turnaround.lookbackTime * 1000)).toBeLessThan(1e-6);
  });

  it("Milne: D_A = D_M/(1+z) rises towards c/(2H0) and never turns over: turnaround is null", async () => {
    const response = await api().get(`/api/v1/angular-size?z=${Z.join(",")}&h0=70&omegaM=0&omegaDE=0&tcmb=0`).set(keyHeader());
    expect(response.status).toBe(200);
    expectClose(response.body.results.scale, Z.map((z) => (milne.transverseComovingDistance(z) / (1 + z)) * 1000 / ARCSEC_PER_RADIAN));
    expect(response.body.turnaround).toBeNull();
  });

  it("size and angle together are refused (422)", async () => {
    const response = await api().get("/api/v1/angular-size?z=1&size=10&angle=1&cosmology=planck18").set(keyHeader());
    expect(response.status).toBe(422);
    expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
    expect(response.body.detail).toContain("size or angle, not both");
  });
});
