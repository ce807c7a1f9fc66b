import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { eds, rel } from "../compute/closed-forms";
import { api, keyHeader, postOversized } from "./support";

const CATALOG = ["id,z,flux", "gal-001,0.5,1.2", "gal-002,not-measured,3.4", "gal-003,-0.2,5.6", "gal-004,1,7.8,extra", "gal-005,2,9.1", "gal-006", '"gal,007",3,0.5'].join("\n") + "\n";
const EDS_QUERY = "h0=70&omegaM=1&tcmb=0";

function parse(text: string) {
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
}

function checkRoundTrip(text: string) {
  const rows = parse(text);
  expect(rows.map((r) => r.id)).toEqual(["gal-001", "gal-002", "gal-003", "gal-004", "gal-005", "gal-006", "gal,007"]);
  const good = rows.filter((r) => r.error === "");
  expect(good.map((r) => r.id)).toEqual(["gal-001", "gal-005", "gal,007"]);
  for (const row of good) {
    const z = Number(row.z);
    // Einstein–de Sitter closed forms (Hogg 1999 eq. 15; t_L = (2/3) t_H (1 − (1+z)^−3/2)).
    expect(rel(Number(row.comovingDistance), eds.comovingDistance(z))).toBeLessThan(1e-6);
    expect(rel(Number(row.lookbackTime), eds.lookbackTime(z))).toBeLessThan(1e-6);
  }
  const byId = Object.fromEntries(rows.map((r) => [r.id, r]));
  expect(byId["gal-001"].flux).toBe("1.2");
  expect(byId["gal-002"].error).toContain("not a number");
  expect(byId["gal-003"].error).toContain("negative");
  expect(byId["gal-004"].error).toContain("expected 3 fields");
  expect(byId["gal-006"].error).toContain("expected 3 fields");
  for (const id of ["gal-002", "gal-003", "gal-004", "gal-006"]) expect(byId[id].comovingDistance).toBe("");
}

describe("/api/v1/catalogs", () => {
  it("raw text/csv: every row comes back (bad ones flagged in error), with the cosmology in the headers", async () => {
    const response = await api()
      .post(`/api/v1/catalogs?${EDS_QUERY}&quantities=comovingDistance,lookbackTime`)
      .set(keyHeader())
      .set("content-type", "text/csv")
      .send(CATALOG);
    expect(response.status, response.text).toBe(200);
    expect(response.headers["content-type"]).toMatch(/^text\/csv/);
    expect(response.text.split("\r\n")[0]).toBe("id,z,flux,comovingDistance,lookbackTime,error");
    checkRoundTrip(response.text);
    expect(response.headers["comova-cosmology-hash"]).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(response.headers["comova-cosmology-ref"]).toBe("inline");
    expect(response.headers["comova-engine-version"]).toMatch(/\d+\.\d+/);
    expect(response.headers["comova-units"]).toBe("comovingDistance=Mpc; lookbackTime=Gyr");
  });

  it("multipart/form-data file field gives the same answer", async () => {
    const response = await api()
      .post(`/api/v1/catalogs?${EDS_QUERY}&quantities=comovingDistance,lookbackTime`)
      .set(keyHeader())
      .attach("file", Buffer.from(CATALOG), { filename: "catalog.csv", contentType: "text/csv" });
    expect(response.status, response.text).toBe(200);
    checkRoundTrip(response.text);
  });

  it("zColumn, units and a preset: the hash matches /distances for the same cosmology", async () => {
    const csv = "name,redshift\na,0.25\nb,1.5\n";
    const response = await api().post("/api/v1/catalogs?cosmology=planck18&zColumn=redshift&quantities=luminosityDistance&distanceUnit=Gpc").set(keyHeader()).set("content-type", "text/csv").send(csv);
    expect(response.status, response.text).toBe(200);
    const distances = await api().post("/api/v1/distances").set(keyHeader()).send({ z: [0.25, 1.5], cosmology: "planck18", distanceUnit: "Gpc" });
    const rows = parse(response.text);
    rows.forEach((row, i) => expect(Number(row.luminosityDistance)).toBe(distances.body.results.luminosityDistance[i]));
    expect(response.headers["comova-cosmology-hash"]).toBe(distances.body.cosmology.hash);
    expect(response.headers["comova-cosmology-ref"]).toBe("planck18@1");
  });

  it("a catalog of 50 000 rows streams back whole", async () => {
    const lines = ["id,z"];
    for (let i = 0; i < 50_000; i++) lines.push(`${i},${(i % 1000) / 100}`);
    const response = await api().post(`/api/v1/catalogs?${EDS_QUERY}&quantities=angularDiameterDistance`).set(keyHeader()).set("content-type", "text/csv").send(lines.join("\n"));
    expect(response.status).toBe(200);
    const rows = parse(response.text);
    expect(rows.length).toBe(50_000);
    expect(rows[12_345].id).toBe("12345");
    expect(rel(Number(rows[12_345].angularDiameterDistance), eds.angularDiameterDistance(3.45))).toBeLessThan(1e-6);
  });

  describe("errors", () => {
    const upload = (query: string, body = "id,z\na,1\n", type = "text/csv") => api().post(`/api/v1/catalogs?${query}`).set(keyHeader()).set("content-type", type).send(body);
    const expectProblem = (response: { status: number; headers: Record<string, string>; body: { detail: string } }, status: number, detail: RegExp) => {
      expect(response.status).toBe(status);
      expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
      expect(response.body.detail).toMatch(detail);
    };

    it("wrong content type → 415", async () => expectProblem(await upload("cosmology=planck18", '{"z":1}', "application/json"), 415, /text\/csv/));
    it("missing z column → 422 listing the columns", async () => expectProblem(await upload("cosmology=planck18&zColumn=zspec"), 422, /no column zspec; its columns are id, z/));
    it("unknown quantity → 422", async () => expectProblem(await upload("cosmology=planck18&quantities=comovingDistance,brightness"), 422, /quantities\[1\]/));
    it("unknown profile → 404", async () => expectProblem(await upload("cosmology=no-such-thing"), 404, /No cosmology named no-such-thing/));
    it("named and inline cosmology → 422", async () => expectProblem(await upload("cosmology=planck18&h0=70"), 422, /not both/));
    it("bad unit → 422", async () => expectProblem(await upload("cosmology=planck18&distanceUnit=furlong"), 422, /distanceUnit/));
    it("empty upload → 422", async () => expectProblem(await upload("cosmology=planck18", ""), 422, /empty/));
    it("a column the answer would add → 422", async () => expectProblem(await upload("cosmology=planck18", "z,error\n1,x\n"), 422, /already has a column named error/));
    it("multipart without a file field → 422", async () => {
      const response = await api().post("/api/v1/catalogs?cosmology=planck18").set(keyHeader()).field("data", "id,z\na,1\n");
      expectProblem(response, 422, /field named file/);
    });
    it("a multipart body over 32 MiB → 413 saying the limit", async () => {
      const boundary = "comova-test-boundary";
      const body = Buffer.concat([
        Buffer.from(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="big.csv"\r\ncontent-type: text/csv\r\n\r\nid,z\r\n`),
        Buffer.alloc(33 * 2 ** 20, "a,1\n"),
        Buffer.from(`\r\n--${boundary}--\r\n`),
      ]);
      const response = await postOversized("/api/v1/catalogs?cosmology=planck18", { ...keyHeader(), "content-type": `multipart/form-data; boundary=${boundary}` }, body);
      expectProblem(response as never, 413, /limit of 33554432 bytes/);
    });
  });
});
