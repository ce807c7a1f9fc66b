// Burst limit and monthly evaluation units on keyed answers (draft-ietf-httpapi-ratelimit-headers-11;
// OWASP API4: unrestricted resource consumption).
import { describe, expect, it } from "vitest";
import { database, session, unique } from "../access/http-helpers";
import { api, keyHeader } from "./support";

async function newKey(limits: { monthlyUnits: number; perMinute: number }): Promise<{ id: string; secret: string }> {
  const response = await api().post("/api/v1/admin/keys").set("Cookie", await session("manager")).send({ name: unique("quota"), ...limits });
  expect(response.status).toBe(201);
  return { id: response.body.key.id, secret: response.body.secret };
}

const oneRedshift = (secret: string) => api().get("/api/v1/distances?z=0.5&cosmology=planck18").set(keyHeader(secret));

describe("rate-limit fields", () => {
  it("every keyed answer carries RateLimit-Policy and RateLimit for the burst and the monthly units", async () => {
    const { secret } = await newKey({ monthlyUnits: 1000, perMinute: 50 });
    const first = await oneRedshift(secret);
    expect(first.status).toBe(200);
    expect(first.headers["ratelimit-policy"]).toMatch(/^"burst";q=50;w=60, "monthly";q=1000;qu="evaluations";w=\d+$/);
    expect(first.headers["ratelimit"]).toMatch(/^"burst";r=49;t=\d+, "monthly";r=999;t=\d+$/);
    const second = await api().post("/api/v1/distances").set(keyHeader(secret)).send({ z: [0.1, 0.2, 0.3], cosmology: "planck18" });
    expect(second.headers["ratelimit"]).toMatch(/^"burst";r=48;t=\d+, "monthly";r=996;t=\d+$/);
  });

  it("over the burst limit: 429 problem+json with Retry-After, naming the burst limit", async () => {
    const { secret } = await newKey({ monthlyUnits: 1000, perMinute: 3 });
    for (let call = 0; call < 3; call++) expect((await oneRedshift(secret)).status).toBe(200);
    const limited = await oneRedshift(secret);
    expect(limited.status).toBe(429);
    expect(limited.headers["content-type"]).toMatch(/^application\/problem\+json/);
    expect(Number(limited.headers["retry-after"])).toBeGreaterThan(0);
    expect(Number(limited.headers["retry-after"])).toBeLessThanOrEqual(60);
    expect(limited.headers["ratelimit"]).toMatch(/^"burst";r=0;/);
    expect(limited.body).toMatchObject({ limit: "burst" });
    expect(limited.body.detail).toContain("burst limit");
  });

  it("over the monthly units: 429 saying which limit and when it resets; nothing is computed or charged", async () => {
    const { id, secret } = await newKey({ monthlyUnits: 2, perMinute: 100 });
    const tooMany = await api().post("/api/v1/distances").set(keyHeader(secret)).send({ z: [0.1, 0.2, 0.3], cosmology: "planck18" });
    expect(tooMany.status).toBe(429);
    expect(tooMany.body).toMatchObject({ limit: "monthly" });
    expect(tooMany.body.detail).toMatch(/monthly quota.*resets at \d{4}-\d{2}-01T00:00:00.000Z/);
    expect(Number(tooMany.headers["retry-after"])).toBeGreaterThan(0);
    const db = database();
    const used = await db.execute({ sql: "select coalesce(sum(units), 0) as n from usage where key_id = ?", args: [id] });
    db.close();
    expect(Number(used.rows[0].n)).toBe(0);
  });
});

describe("monthly quota exactness", () => {
  it("200 concurrent one-redshift calls against room for 100: exactly 100 succeed and usage reads 100", async () => {
    const { id, secret } = await newKey({ monthlyUnits: 100, perMinute: 1000 });
    const statuses = await Promise.all(Array.from({ length: 200 }, () => oneRedshift(secret).then((r) => r.status)));
    expect(statuses.filter((s) => s === 200)).toHaveLength(100);
    expect(statuses.filter((s) => s === 429)).toHaveLength(100);
    const db = database();
    const used = await db.execute({ sql: "select units from usage where key_id = ?", args: [id] });
    const logged = await db.execute({ sql: "select count(*) as n, sum(evaluations) as e from request_log where key_id = ?", args: [id] });
    db.close();
    expect(Number(used.rows[0].units)).toBe(100);
    expect(Number(logged.rows[0].n)).toBe(200);
    expect(Number(logged.rows[0].e)).toBe(100);
  }, 120_000);
});

describe("streamed catalogs in the request log and the quota", () => {
  const catalogOf = (rows: number) => "id,z\n" + Array.from({ length: rows }, (_, i) => `g${i},${(0.01 + (i % 300) / 100).toFixed(2)}`).join("\n") + "\n";
  const upload = (secret: string, body: string) =>
    api().post("/api/v1/catalogs?cosmology=planck18&quantities=comovingDistance").set(keyHeader(secret)).set("content-type", "text/csv").send(body);
  const logOf = async (id: string) => {
    const db = database();
    const logged = await db.execute({ sql: "select status, evaluations from request_log where key_id = ? order by id", args: [id] });
    const used = await db.execute({ sql: "select coalesce(sum(units), 0) as n from usage where key_id = ?", args: [id] });
    db.close();
    return { entries: logged.rows.map((r) => ({ status: Number(r.status), evaluations: Number(r.evaluations) })), used: Number(used.rows[0].n) };
  };

  it("a catalog charged batch by batch is logged with every evaluation of the whole stream", async () => {
    const rows = 10_000; // several streaming batches
    const { id, secret } = await newKey({ monthlyUnits: 50_000, perMinute: 100 });
    const response = await upload(secret, catalogOf(rows));
    expect(response.status).toBe(200);
    expect(response.text.trim().split("\n")).toHaveLength(rows + 1);
    expect(await logOf(id)).toEqual({ entries: [{ status: 200, evaluations: rows }], used: rows });
  });

  it("a catalog that runs out of monthly units mid-stream is cut off and logged as 429 with what was spent", async () => {
    const { id, secret } = await newKey({ monthlyUnits: 6_000, perMinute: 100 });
    await expect(upload(secret, catalogOf(10_000))).rejects.toThrow();
    const { entries, used } = await logOf(id);
    expect(entries).toHaveLength(1);
    expect(entries[0].status).toBe(429);
    expect(entries[0].evaluations).toBe(used);
    expect(used).toBeGreaterThan(0);
    expect(used).toBeLessThanOrEqual(6_000);
  });
});
