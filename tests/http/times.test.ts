import { describe, expect, it } from "vitest";
import { GYR_S, T_H, eds, expectClose, milne } from "../compute/closed-forms";
import { api, keyHeader } from "./support";

const Z = [0, 0.5, 1, 3, 10];

async function lookback(query: string) {
  const response = await api().get(`/api/v1/lookback-time?${query}`).set(keyHeader());
  expect(response.status, JSON.stringify(response.body)).toBe(200);
  return response.body;
}

describe("/api/v1/lookback-time", () => {
  it("Einstein–de Sitter: t_L = (2/3) t_H (1 − (1+z)^−3/2), age = (2/3) t_H (1+z)^−3/2 (Hogg 1999 §8; Peebles 1993)", async () => {
    const { results, cosmology, units } = await lookback(`z=${Z.join(",")}&h0=70&omegaM=1&tcmb=0`);
    expectClose(results.lookbackTime.slice(1), Z.slice(1).map(eds.lookbackTime));
    expect(results.lookbackTime[0]).toBe(0);
    expectClose(results.age, Z.map(eds.age));
    expect(cosmology.derived.ageToday).toBeCloseTo(eds.age(0), 6);
    expect(units).toMatchObject({ distance: "Mpc", time: "Gyr" });
  });

  it("Milne: t_L = t_H z/(1+z), age = t_H/(1+z)", async () => {
    const { results } = await lookback(`z=${Z.join(",")}&h0=70&omegaM=0&omegaDE=0&tcmb=0`);
    expectClose(results.lookbackTime.slice(1), Z.slice(1).map(milne.lookbackTime));
    expectClose(results.age, Z.map(milne.age));
  });

  it.each([
    ["Myr", 1e3],
    ["yr", 1e9],
    ["s", GYR_S], // Julian year of 365.25 d (IAU)
  ])("timeUnit=%s scales every time and is echoed", async (unit, factor) => {
    const { results, units } = await lookback(`z=1,3&h0=70&omegaM=1&tcmb=0&timeUnit=${unit}`);
    expect(units.time).toBe(unit);
    expectClose(results.age, [1, 3].map((z) => eds.age(z) * factor));
  });

  it("Planck 2018: the age today is 13.787 ± 0.020 Gyr (A&A 641, A6 (2020), Table 2, TT,TE,EE+lowE+lensing+BAO)", async () => {
    const { results, cosmology } = await lookback("z=0&cosmology=planck18");
    expect(Math.abs(cosmology.derived.ageToday - 13.787)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(results.age[0] - 13.787)).toBeLessThanOrEqual(0.02);
    // The Hubble time 1/H0 for H0 = 67.66 km/s/Mpc.
    expect(cosmology.derived.hubbleTime).toBeCloseTo((T_H * 70) / 67.66, 6);
  });

  it("POST takes the same fields as a JSON body", async () => {
    const response = await api().post("/api/v1/lookback-time").set(keyHeader()).send({ z: [1], ...eds.inline, timeUnit: "Myr" });
    expect(response.status).toBe(200);
    expectClose(response.body.results.lookbackTime, [eds.lookbackTime(1) * 1e3]);
  });
});
