// API keys over HTTP: issue (secret shown once), scopes, revoke, rotate with overlap, expiry, and
// cross-team isolation (OWASP API1: broken object level authorization; API2: broken authentication).
import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_MONTHLY_UNITS } from "@/api-core/access/types";
import { database, DEMO_TEAM_ID, session, unique } from "../access/http-helpers";
import { api, keyHeader } from "./support";

const compute = (key: string) => api().get("/api/v1/distances?z=0.5&cosmology=planck18").set(keyHeader(key));

async function issue(role: "administrator" | "manager" | "member", body: object) {
  const response = await api().post("/api/v1/admin/keys").set("Cookie", await session(role)).send({ name: unique("key"), ...body });
  expect(response.status).toBe(201);
  return response.body as { key: { id: string; prefix: string; teamId: string; userId: string | null; scopes: string[] }; secret: string };
}

let otherTeamId = "";
beforeAll(async () => {
  const team = await api().post("/api/v1/admin/teams").set("Cookie", await session("administrator")).send({ slug: unique("orion"), name: "Orion Deep Field" });
  otherTeamId = team.body.team.id;
});

describe("issuing keys", () => {
  it("shows the secret once: in the 201 answer only, never in a listing", async () => {
    const { key, secret } = await issue("manager", { scopes: ["compute"] });
    expect(secret).toMatch(/^cmv_[0-9a-hjkmnp-tv-z]{38}$/);
    expect(secret.startsWith(key.prefix)).toBe(true);
    expect(key).not.toHaveProperty("secretHash");
    for (const role of ["administrator", "manager", "auditor"] as const) {
      const listing = await api().get("/api/v1/admin/keys").set("Cookie", await session(role));
      expect(listing.status).toBe(200);
      expect(listing.text).not.toContain(secret);
      expect(listing.text).not.toContain(secret.slice(10));
    }
    expect((await compute(secret)).status).toBe(200);
  });

  it("makes a member's key their own, in their team, and refuses raising their own limits (403)", async () => {
    const { key } = await issue("member", { userId: null });
    expect(key).toMatchObject({ teamId: DEMO_TEAM_ID, userId: "user_demo_member" });
    const greedy = await api().post("/api/v1/admin/keys").set("Cookie", await session("member")).send({ name: "greedy", monthlyUnits: DEFAULT_MONTHLY_UNITS + 1 });
    expect(greedy.status).toBe(403);
  });

  it("keeps the manager in their team: issuing into another team answers 404 and creates nothing", async () => {
    const response = await api().post("/api/v1/admin/keys").set("Cookie", await session("manager")).send({ name: "intruder", teamId: otherTeamId });
    expect(response.status).toBe(404);
    const db = database();
    const rows = await db.execute({ sql: "select count(*) as n from api_keys where team_id = ?", args: [otherTeamId] });
    db.close();
    expect(Number(rows.rows[0].n)).toBe(0);
  });

  it("refuses a key without the route's scope with 403 (OWASP API5)", async () => {
    const { secret } = await issue("manager", { scopes: ["profiles:write"] });
    const response = await compute(secret);
    expect(response.status).toBe(403);
    expect(response.body.detail).toContain('"compute"');
  });
});

describe("keys that must not work answer 401 problem+json with WWW-Authenticate: Bearer", () => {
  const expect401 = async (response: Awaited<ReturnType<typeof compute>>) => {
    expect(response.status).toBe(401);
    expect(response.headers["www-authenticate"]).toMatch(/^Bearer /);
    expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
  };

  it("missing, malformed and unknown keys", async () => {
    await expect401(await api().get("/api/v1/distances?z=0.5&cosmology=planck18"));
    await expect401(await compute("not-a-key"));
    await expect401(await compute("cmv_" + "0".repeat(38)));
  });

  it("a revoked key, at once", async () => {
    const { key, secret } = await issue("manager", {});
    expect((await compute(secret)).status).toBe(200);
    const revoked = await api().post(`/api/v1/admin/keys/${key.id}/revoke`).set("Cookie", await session("manager"));
    expect(revoked.body.key.status).toBe("revoked");
    await expect401(await compute(secret));
    const log = await api().get(`/api/v1/admin/request-log?keyId=${key.id}`).set("Cookie", await session("administrator"));
    expect(log.body.entries.map((e: { status: number }) => e.status)).toEqual([401, 200]);
  });

  it("an expired key", async () => {
    const { secret } = await issue("manager", { expiresAt: Date.now() + 1500 });
    expect((await compute(secret)).status).toBe(200);
    await new Promise((r) => setTimeout(r, 1600));
    await expect401(await compute(secret));
  });
});

describe("rotation", () => {
  it("gives a new secret; the old one works during the overlap and not after", async () => {
    const { key, secret } = await issue("manager", {});
    const rotated = await api().post(`/api/v1/admin/keys/${key.id}/rotate`).set("Cookie", await session("manager")).send({ overlapSeconds: 2 });
    expect(rotated.status).toBe(201);
    expect(rotated.body.secret).not.toBe(secret);
    expect(rotated.body.previous).toMatchObject({ id: key.id, replacedBy: rotated.body.key.id });
    expect((await compute(secret)).status).toBe(200);
    expect((await compute(rotated.body.secret)).status).toBe(200);
    await new Promise((r) => setTimeout(r, 2100));
    expect((await compute(secret)).status).toBe(401);
    expect((await compute(rotated.body.secret)).status).toBe(200);
  });
});

describe("another team's keys (OWASP API1)", () => {
  it("cannot be seen, revoked or rotated by a manager, member or auditor of the demo team: 404 and unchanged", async () => {
    const { key, secret } = await issue("administrator", { teamId: otherTeamId });
    for (const role of ["manager", "member"] as const) {
      const cookie = await session(role);
      expect((await api().post(`/api/v1/admin/keys/${key.id}/revoke`).set("Cookie", cookie)).status).toBe(404);
      expect((await api().post(`/api/v1/admin/keys/${key.id}/rotate`).set("Cookie", cookie).send({})).status).toBe(404);
    }
    for (const role of ["manager", "member", "auditor"] as const) {
      const listing = await api().get(`/api/v1/admin/keys?teamId=${otherTeamId}`).set("Cookie", await session(role));
      expect(listing.body.keys).toEqual([]);
    }
    expect((await compute(secret)).status).toBe(200);
  });

  it("a member sees only their own keys", async () => {
    const { key } = await issue("manager", {});
    const listing = await api().get("/api/v1/admin/keys").set("Cookie", await session("member"));
    expect(listing.body.keys.map((k: { id: string }) => k.id)).not.toContain(key.id);
    expect(listing.body.keys.every((k: { userId: string }) => k.userId === "user_demo_member")).toBe(true);
  });
});
