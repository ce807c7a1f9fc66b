import { describe, expect, it } from "vitest";
import { parseInput, queryToObject } from "@/api-core/compute/input";
import { ProblemError } from "@/api-core/http/problem";
import { DistancesInput, RedshiftsInput } from "@/openapi/compute";
import { LIMITS } from "@/openapi/limits";

const query = (text: string) => queryToObject(new URLSearchParams(text), DistancesInput, 5);

describe("queryToObject: a GET query as the object a JSON body would give", () => {
  it("splits lists on commas (and joins repeated keys), turns numeric fields into numbers, keeps text fields", () => {
    expect(query("z=0.1,1e-2,3&z=4&cosmology=planck18&h0=70&distanceUnit=Mpc/h")).toEqual({ z: [0.1, 0.01, 3, 4], cosmology: "planck18", h0: 70, distanceUnit: "Mpc/h" });
  });

  it("hands NaN, Infinity and non-numbers to the schema unconverted enough for it to name them", () => {
    expect(query("z=NaN,Infinity,abc,,0x10")).toEqual({ z: [NaN, Infinity, "abc", "", "0x10"] });
    expect(query("z=")).toEqual({ z: [] });
  });

  it("refuses a list longer than the GET limit with 422 naming the field", () => {
    const error = (() => {
      try {
        query("z=1,2,3,4,5,6");
      } catch (e) {
        return e as ProblemError;
      }
    })();
    expect(error).toBeInstanceOf(ProblemError);
    expect(error!.status).toBe(422);
    expect(error!.detail).toContain("at most 5 values");
  });
});

describe("parseInput", () => {
  const get = (q: string) => new Request(`http://x/api/v1/distances?${q}`);
  const post = (body: string, type = "application/json") => new Request("http://x/api/v1/distances", { method: "POST", body, headers: { "content-type": type } });

  it("GET and POST give the same validated input", async () => {
    const fromGet = await parseInput(get("z=0.5,1&cosmology=planck18"), DistancesInput, LIMITS);
    const fromPost = await parseInput(post(JSON.stringify({ z: [0.5, 1], cosmology: "planck18" })), DistancesInput, LIMITS);
    expect(fromGet).toEqual(fromPost);
  });

  it.each([
    ["malformed JSON", post("{"), 400],
    ["text/plain", post("{}", "text/plain"), 415],
    ["a body over the limit", post(JSON.stringify({ z: [1], cosmology: " ".repeat(100) })), 413],
  ])("%s → %d", async (_, request, status) => {
    await expect(parseInput(request, DistancesInput, { ...LIMITS, jsonBodyBytes: 50 })).rejects.toMatchObject({ status });
  });

  it("the schema: both cosmologies, none, and an inline one without omegaM are refused", async () => {
    await expect(parseInput(get("z=1&cosmology=planck18&w0=-0.9"), DistancesInput, LIMITS)).rejects.toThrow(/not both/);
    await expect(parseInput(get("z=1"), DistancesInput, LIMITS)).rejects.toThrow(/choose a cosmology/);
    await expect(parseInput(get("z=1&h0=70"), DistancesInput, LIMITS)).rejects.toThrow(/omegaM is required/);
    await expect(parseInput(get("age=1&lookbackTime=2&cosmology=planck18"), RedshiftsInput, LIMITS)).rejects.toThrow(/exactly one of/);
  });
});
