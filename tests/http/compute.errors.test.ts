// Every documented error of the compute endpoints answers problem+json (RFC 9457) with the right status
// and an actionable detail.
import { describe, expect, it } from "vitest";
import { api, keyHeader, postOversized } from "./support";

/** A valid GET query (without the cosmology) and its JSON equivalent, per endpoint. */
const ENDPOINTS: [path: string, query: string, body: Record<string, unknown>][] = [
  ["/api/v1/distances", "z=0.5,1", { z: [0.5, 1] }],
  ["/api/v1/lookback-time", "z=0.5,1", { z: [0.5, 1] }],
  ["/api/v1/angular-size", "z=0.5,1", { z: [0.5, 1] }],
  ["/api/v1/volumes", "zMax=0.5,1", { zMax: [0.5, 1] }],
  ["/api/v1/expansion", "z=0.5,1", { z: [0.5, 1] }],
  ["/api/v1/redshifts", "lookbackTime=1,2", { lookbackTime: [1, 2] }],
];

/** The list field of each endpoint. */
const listField = (body: Record<string, unknown>) => Object.keys(body)[0];

function expectProblem(response: { status: number; headers: Record<string, string>; body: Record<string, unknown> }, status: number, detail?: string | RegExp) {
  expect(response.status, JSON.stringify(response.body)).toBe(status);
  expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
  expect(response.body).toMatchObject({ status, type: expect.stringMatching(/^urn:comova:problem:/), title: expect.any(String) });
  expect(response.body.detail).toEqual(expect.any(String));
  if (detail) expect(response.body.detail).toMatch(detail);
}

describe.each(ENDPOINTS)("%s errors", (path, query, body) => {
  const list = listField(body);
  const get = (q: string) => api().get(`${path}?${q}`).set(keyHeader());
  const post = (b: unknown) => api().post(path).set(keyHeader()).send(b as object);

  it("a negative value → 422 naming the index", async () => {
    expectProblem(await get(`${list}=1,-0.5&cosmology=planck18`), 422, new RegExp(`${list}\\[1\\]: .*≥ 0`));
    expectProblem(await post({ [list]: [1, -0.5], cosmology: "planck18" }), 422, new RegExp(`${list}\\[1\\]`));
  });

  it("NaN, Infinity or text where a number belongs → 422", async () => {
    expectProblem(await get(`${list}=NaN&cosmology=planck18`), 422, /expected number, received NaN/);
    expectProblem(await get(`${list}=1,Infinity&cosmology=planck18`), 422, new RegExp(`${list}\\[1\\]`));
    expectProblem(await get(`${list}=0.5,far&cosmology=planck18`), 422, /expected number, received string/);
    expectProblem(await post({ [list]: ["0.5"], cosmology: "planck18" }), 422, /expected number/);
    expectProblem(await post({ [list]: 0.5, cosmology: "planck18" }), 422, /expected array/);
  });

  it("an empty list → 422", async () => {
    expectProblem(await get(`${list}=&cosmology=planck18`), 422, /at least one value/);
    expectProblem(await post({ [list]: [], cosmology: "planck18" }), 422, /at least one value/);
  });

  it("a query list over the GET limit → 422 saying the limit and pointing to POST", async () => {
    const values = Array.from({ length: 1001 }, () => "1").join(",");
    expectProblem(await get(`${list}=${values}&cosmology=planck18`), 422, /at most 1000 values.*POST/);
  });

  it("an unknown profile → 404; an unknown version of a preset → 404", async () => {
    expectProblem(await get(`${query}&cosmology=no-such-profile`), 404, /No cosmology named no-such-profile.*\/api\/v1\/cosmologies/);
    expectProblem(await get(`${query}&cosmology=planck18@7`), 404, /planck18 has no version 7/);
  });

  it("a named and an inline cosmology together → 422 saying so; neither → 422", async () => {
    expectProblem(await get(`${query}&cosmology=planck18&h0=70&omegaM=0.3`), 422, /either cosmology=planck18 or inline parameters, not both/);
    expectProblem(await post({ ...body, cosmology: "planck18", omegaM: 0.3 }), 422, /not both/);
    expectProblem(await get(query), 422, /choose a cosmology/);
    expectProblem(await get(`${query}&h0=70`), 422, /omegaM is required/);
  });

  it("a bad unit → 422 listing the accepted ones", async () => {
    expectProblem(await get(`${query}&cosmology=planck18&distanceUnit=au`), 422, /distanceUnit.*"Mpc"/);
    expectProblem(await post({ ...body, cosmology: "planck18", timeUnit: "fortnight" }), 422, /timeUnit.*"Gyr"/);
  });

  it("an unknown parameter → 422 naming it", async () => {
    expectProblem(await get(`${query}&cosmology=planck18&omegam=0.3`), 422, /omegam/);
  });

  it("parameters outside their range or with no big bang → 422 naming the parameter", async () => {
    const tooBig = await get(`${query}&h0=70&omegaM=0.3&w0=9`);
    expectProblem(tooBig, 422, /w0/);
    // Ωm = 0, ΩΛ = 2: E(z)² = 2 − (1+z)² turns negative at z = √2 − 1 (a bouncing universe, no big bang).
    const bounce = await get(`${query}&h0=70&omegaM=0&omegaDE=2&tcmb=0`);
    expectProblem(bounce, 422);
    expect((bounce.body.errors as { parameter: string }[])[0].parameter).toMatch(/omega/);
  });

  it("malformed JSON → 400; a body that is not JSON → 415", async () => {
    expectProblem(await api().post(path).set(keyHeader()).set("content-type", "application/json").send('{"z": [1, 2'), 400, /not valid JSON/);
    expectProblem(await api().post(path).set(keyHeader()).set("content-type", "text/plain").send(JSON.stringify({ ...body, cosmology: "planck18" })), 415, /application\/json/);
  });
});

describe("limits of a POST body", () => {
  it("more than 1 000 000 redshifts → 422 saying the limit", async () => {
    const response = await api().post("/api/v1/distances").set(keyHeader()).send({ z: new Array(1_000_001).fill(0), cosmology: "planck18" });
    expectProblem(response, 422, /at most 1000000 values per call/);
  });

  it("a body over 32 MiB → 413 saying the limit", async () => {
    const body = Buffer.from(`{"z":[1],"cosmology":"planck18"${" ".repeat(33 * 2 ** 20)}}`);
    const response = await postOversized("/api/v1/distances", { ...keyHeader(), "content-type": "application/json" }, body);
    expectProblem(response as never, 413, /limit of 33554432 bytes/);
  });

  it("zSource below z and a zSource list of another length → 422", async () => {
    expectProblem(await api().post("/api/v1/distances").set(keyHeader()).send({ z: [1, 2], zSource: [1.5], cosmology: "planck18" }), 422, /zSource must be ≥ z; at index 1/);
    expectProblem(await api().post("/api/v1/distances").set(keyHeader()).send({ z: [1, 2, 3], zSource: [4, 5], cosmology: "planck18" }), 422, /one per z \(3\); got 2/);
  });
});
