import { describe, expect, it } from "vitest";
import { D_H, T_H, eds, rel } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

async function invert(body: object) {
  const response = await api().post("/api/v1/redshifts").set(keyHeader()).send({ ...eds.inline, ...body });
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return response.body.results;
}

const close = (got: number[], expected: number[], tolerance = 1e-6) => {
  expect(got.length).toBe(expected.length);
  got.forEach((g, i) => expect(rel(g, expected[i])).toBeLessThan(tolerance));
};

describe("/api/v1/redshifts — Einstein–de Sitter inverses of the closed forms", () => {
  it("comovingDistance: z = 1/(1 − D_C/2D_H)² − 1", async () => {
    const values = [1000, 3000, 5000];
    const results = await invert({ comovingDistance: values });
    expect(results.comovingDistance).toEqual(values);
    results.z.forEach((zs: number[], i: number) => close(zs, [1 / (1 - values[i] / (2 * D_H)) ** 2 - 1]));
  });

  it("luminosityDistance: √(1+z) = (1 + √(1 + 2 D_L/D_H))/2", async () => {
    const results = await invert({ luminosityDistance: [2000, 20000] });
    results.z.forEach((zs: number[], i: number) => {
      const s = (1 + Math.sqrt(1 + (2 * [2000, 20000][i]) / D_H)) / 2;
      close(zs, [s * s - 1]);
    });
  });

  it("lookbackTime and age (Gyr and Myr), and an empty list beyond the age of the universe", async () => {
    const lookback = await invert({ lookbackTime: [2, 5, 100] });
    close(lookback.z[0], [(1 - 2 / ((2 / 3) * T_H)) ** (-2 / 3) - 1]);
    close(lookback.z[1], [(1 - 5 / ((2 / 3) * T_H)) ** (-2 / 3) - 1]);
    expect(lookback.z[2]).toEqual([]);
    const age = await invert({ age: [1000], timeUnit: "Myr" });
    close(age.z[0], [(1 / ((2 / 3) * T_H)) ** (-2 / 3) - 1]);
  });

  it("angularDiameterDistance below its maximum (8/27) D_H gives both roots of u²(1 − u) = D_A/2D_H, u = 1/√(1+z)", async () => {
    const value = eds.angularDiameterDistance(0.5);
    const u1 = 1 / Math.sqrt(1.5);
    // Deflating u³ − u² + c by (u − u1) leaves u² + (u1 − 1) u + u1 (u1 − 1).
    const a = u1 - 1;
    const b = u1 * (u1 - 1);
    const u2 = (-a - Math.sqrt(a * a - 4 * b)) / 2 > 0 ? (-a - Math.sqrt(a * a - 4 * b)) / 2 : (-a + Math.sqrt(a * a - 4 * b)) / 2;
    const results = await invert({ angularDiameterDistance: [value, D_H] });
    close(results.z[0], [0.5, 1 / (u2 * u2) - 1]);
    expect(results.z[1]).toEqual([]); // above the maximum: no redshift
  });

  it("exactly one quantity per call (422 otherwise)", async () => {
    for (const body of [{}, { age: [1], lookbackTime: [1] }]) {
      const response = await api().post("/api/v1/redshifts").set(keyHeader()).send({ ...eds.inline, ...body });
      expect(response.status).toBe(422);
      expect(response.body.detail).toContain("give exactly one of");
    }
  });
});
