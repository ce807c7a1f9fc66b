import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { createClient } from "@libsql/client";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { api, keyHeader } from "./support";

const profileCount = async () => {
  const client = createClient({ url: inject("databaseUrl") });
  try {
    return Number((await client.execute("select count(*) as n from profiles")).rows[0].n);
  } finally {
    client.close();
  }
};

/** A key of a second team, made with the admin CLI as an operator would. */
async function otherTeamKey(): Promise<string> {
  const admin = (...args: string[]) =>
    promisify(execFile)(process.execPath, ["--import", "tsx", "scripts/admin.ts", ...args], { env: { ...process.env, DATABASE_URL: inject("databaseUrl") } });
  await admin("create-team", "--slug", "rival-survey", "--name", "Rival Survey");
  const { stdout } = await admin("create-key", "--team", "rival-survey", "--name", "tests", "--scopes", "compute,profiles:write");
  return stdout.trim().split("\n").pop()!;
}

const slug = `test-fiducial-${Date.now().toString(36)}`;
const createProfile = (body: object, key?: string) => api().post("/api/v1/cosmologies").set(keyHeader(key)).send(body);

describe("/api/v1/cosmologies", () => {
  let rivalKey: string;
  beforeAll(async () => {
    rivalKey = await otherTeamKey();
  });

  it("GET lists the presets with their refs, hashes and resolved parameters", async () => {
    const response = await api().get("/api/v1/cosmologies").set(keyHeader());
    expect(response.status).toBe(200);
    const refs = response.body.cosmologies.map((c: { ref: string }) => c.ref);
    expect(refs).toEqual(expect.arrayContaining(["planck18@1", "planck15@1", "wmap9@1", "textbook@1"]));
    const planck = response.body.cosmologies.find((c: { slug: string }) => c.slug === "planck18");
    // Planck 2018, A&A 641, A6, Table 2, TT,TE,EE+lowE+lensing+BAO: H0 = 67.66, Ωm = 0.3111.
    expect(planck).toMatchObject({ kind: "preset", version: 1, parameters: { h0: 67.66, omegaM: 0.3111 } });
    expect(planck.hash).toMatch(/^sha256:[0-9a-f]{64}$/);
  });

  it("POST saves version 1, then version 2 for the same slug; older versions never change", async () => {
    const first = await createProfile({ slug, title: "Test fiducial", parameters: { h0: 70, omegaM: 1, tcmb: 0 } });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body).toMatchObject({ kind: "profile", slug, version: 1, ref: `${slug}@1`, parameters: { h0: 70, omegaM: 1, omegaDE: null, tcmb: 0, nEff: 3.046, w0: -1, wa: 0 } });
    const second = await createProfile({ slug, title: "Test fiducial, revised", parameters: { h0: 70, omegaM: 0, omegaDE: 0, tcmb: 0 } });
    expect(second.status).toBe(201);
    expect(second.body.version).toBe(2);
    expect(second.body.hash).not.toBe(first.body.hash);

    const detail = await api().get(`/api/v1/cosmologies/${slug}`).set(keyHeader());
    expect(detail.status).toBe(200);
    expect(detail.body.latest).toBe(`${slug}@2`);
    expect(detail.body.versions.map((v: { version: number }) => v.version)).toEqual([1, 2]);
    expect(detail.body.versions[0]).toEqual(first.body);

    const list = await api().get("/api/v1/cosmologies").set(keyHeader());
    expect(list.body.cosmologies.filter((c: { slug: string }) => c.slug === slug).map((c: { ref: string }) => c.ref)).toEqual([`${slug}@2`]);

    // Each creation is on the audit trail, made by the key (its prefix, never its secret).
    const client = createClient({ url: inject("databaseUrl") });
    const audit = await client.execute({ sql: "select actor_email, detail from audit_trail where action = 'profile.created' and target_type = 'profile' and detail like ? order by id", args: [`%"slug":"${slug}"%`] });
    client.close();
    expect(audit.rows.map((r) => JSON.parse(String(r.detail)))).toEqual([
      { slug, version: 1, hash: first.body.hash },
      { slug, version: 2, hash: second.body.hash },
    ]);
    expect(String(audit.rows[0].actor_email)).toMatch(/^cmv_/);
    expect(inject("computeKey").startsWith(String(audit.rows[0].actor_email))).toBe(true);
    expect(String(audit.rows[0].actor_email).length).toBeLessThan(inject("computeKey").length);
  });

  it("slug@version pins; slug alone is the latest; a profile hashes like the same parameters inline", async () => {
    const pinned = await api().get(`/api/v1/distances?z=1&cosmology=${slug}@1`).set(keyHeader());
    expect(pinned.status).toBe(200);
    expect(pinned.body.cosmology.ref).toBe(`${slug}@1`);
    // Version 1 is Einstein–de Sitter: D_C(1) = 2 c/H0 (1 − 1/√2).
    expect(pinned.body.results.comovingDistance[0]).toBeCloseTo(2 * (299792.458 / 70) * (1 - Math.SQRT1_2), 3);
    const inline = await api().get("/api/v1/distances?z=1&h0=70&omegaM=1&tcmb=0").set(keyHeader());
    expect(inline.body.cosmology.hash).toBe(pinned.body.cosmology.hash);
    const latest = await api().get(`/api/v1/distances?z=1&cosmology=${slug}`).set(keyHeader());
    expect(latest.body.cosmology.ref).toBe(`${slug}@2`);
    // Version 2 is Milne: D_C(1) = c/H0 ln 2.
    expect(latest.body.results.comovingDistance[0]).toBeCloseTo((299792.458 / 70) * Math.LN2, 3);
  });

  it("another team's profile is invisible: 404 by slug, not listed, unusable in a computation", async () => {
    const rival = await createProfile({ slug: "rival-secret", title: "Rival", parameters: { h0: 72, omegaM: 0.25 } }, rivalKey);
    expect(rival.status).toBe(201);
    expect((await api().get("/api/v1/cosmologies/rival-secret").set(keyHeader(rivalKey))).status).toBe(200);

    const detail = await api().get("/api/v1/cosmologies/rival-secret").set(keyHeader());
    expect(detail.status).toBe(404);
    expect(detail.headers["content-type"]).toMatch(/^application\/problem\+json/);
    const list = await api().get("/api/v1/cosmologies").set(keyHeader());
    expect(list.body.cosmologies.map((c: { slug: string }) => c.slug)).not.toContain("rival-secret");
    expect((await api().get("/api/v1/distances?z=1&cosmology=rival-secret").set(keyHeader())).status).toBe(404);
    // And the other way round, and the seeded demo profile of the Lantern Ridge team likewise.
    expect((await api().get(`/api/v1/cosmologies/${slug}`).set(keyHeader(rivalKey))).status).toBe(404);
    expect((await api().get("/api/v1/cosmologies/lantern-fiducial").set(keyHeader())).status).toBe(404);
  });
});

describe("POST /api/v1/cosmologies errors change nothing", () => {
  const good = { slug: "error-probe", title: "Probe", parameters: { h0: 70, omegaM: 0.3 } };
  it.each([
    ["no key", () => api().post("/api/v1/cosmologies").send(good), 401, /API key/],
    ["malformed JSON", () => api().post("/api/v1/cosmologies").set(keyHeader()).set("content-type", "application/json").send('{"slug":'), 400, /not valid JSON/],
    ["not JSON", () => api().post("/api/v1/cosmologies").set(keyHeader()).set("content-type", "text/plain").send(JSON.stringify(good)), 415, /application\/json/],
    ["a bad slug", () => createProfile({ ...good, slug: "Bad Slug!" }), 422, /slug/],
    ["a preset's slug", () => createProfile({ ...good, slug: "planck18" }), 409, /preset/],
    ["a missing h0", () => createProfile({ ...good, parameters: { omegaM: 0.3 } }), 422, /parameters\.h0/],
    ["a wrong type", () => createProfile({ ...good, parameters: { h0: "seventy", omegaM: 0.3 } }), 422, /expected number/],
    ["an unknown field", () => createProfile({ ...good, parameters: { ...good.parameters, omegaL: 0.7 } }), 422, /omegaL/],
    // Ωm = 0, ΩΛ = 2: E(z)² = 2 − (1+z)² < 0 beyond z = √2 − 1: no big bang.
    ["no big bang", () => createProfile({ ...good, parameters: { h0: 70, omegaM: 0, omegaDE: 2, tcmb: 0 } }), 422, /./],
  ])("%s → problem+json, profile count unchanged", async (_, send, status, detail) => {
    const before = await profileCount();
    const response = await send();
    expect(response.status, JSON.stringify(response.body)).toBe(status);
    expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
    expect(response.body.detail).toMatch(detail);
    expect(await profileCount()).toBe(before);
  });

  it("GET of an unknown slug → 404 naming what exists", async () => {
    const response = await api().get("/api/v1/cosmologies/nowhere-cosmology").set(keyHeader());
    expect(response.status).toBe(404);
    expect(response.body.detail).toContain("planck18");
  });
});
