// The request log: every keyed call (errors included once a key is identified), filters, cursor
// pages, CSV; never a secret — neither in the log, nor the server output, nor any answer after creation.
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { database, session, unique } from "../access/http-helpers";
import { api, keyHeader } from "./support";

const WRONG_PASSWORD = "a-wrong-password-that-must-not-be-logged";
let key = { id: "", secret: "" };
beforeAll(async () => {
  const response = await api().post("/api/v1/admin/keys").set("Cookie", await session("manager")).send({ name: unique("logged"), scopes: ["compute"] });
  key = { id: response.body.key.id, secret: response.body.secret };
  await api().get("/api/v1/distances?z=0.5,1&cosmology=planck18").set(keyHeader(key.secret)).set("X-Forwarded-For", "203.0.113.50");
  await api().get("/api/v1/distances?z=-1&cosmology=planck18").set(keyHeader(key.secret));
  await api().post("/api/v1/cosmologies").set(keyHeader(key.secret)).send({});
  await api().post("/api/v1/admin/session").set("X-Forwarded-For", "203.0.113.51").send({ email: "ferro@lantern-ridge.example", password: WRONG_PASSWORD });
});

const readLog = async (query: string, role: "administrator" | "auditor" = "auditor") =>
  api().get(`/api/v1/admin/request-log?${query}`).set("Cookie", await session(role));

describe("request log", () => {
  it("records each keyed call with its key prefix, team, route, status, evaluations, cosmology and address", async () => {
    const response = await readLog(`keyId=${key.id}`);
    expect(response.status).toBe(200);
    const [forbidden, invalid, ok] = response.body.entries;
    expect(ok).toMatchObject({ keyId: key.id, keyPrefix: key.secret.slice(0, 10), teamId: "team_lantern_ridge", method: "GET", route: "/api/v1/distances", status: 200, evaluations: 2, clientAddress: "203.0.113.50" });
    expect(ok.cosmologyHash).toMatch(/^sha256:/);
    expect(ok.cosmologyRef).toMatch(/^planck18/);
    expect(invalid).toMatchObject({ status: 422, evaluations: 0 });
    expect(forbidden).toMatchObject({ status: 403, route: "/api/v1/cosmologies", method: "POST" });
  });

  it("filters by status and route, and pages by cursor without gaps or repeats", async () => {
    expect((await readLog(`keyId=${key.id}&status=422`)).body.entries).toHaveLength(1);
    expect((await readLog(`keyId=${key.id}&route=/api/v1/cosmologies`)).body.entries).toHaveLength(1);
    const first = await readLog(`keyId=${key.id}&limit=2`);
    expect(first.body.entries).toHaveLength(2);
    const second = await readLog(`keyId=${key.id}&limit=2&before=${first.body.nextBefore}`);
    expect(second.body.entries).toHaveLength(1);
    expect(second.body.nextBefore).toBeNull();
    const all = await readLog(`keyId=${key.id}`);
    expect([...first.body.entries, ...second.body.entries].map((e: { id: number }) => e.id)).toEqual(all.body.entries.map((e: { id: number }) => e.id));
  });

  it("filters by time range", async () => {
    expect((await readLog(`keyId=${key.id}&from=${Date.now() + 60_000}`)).body.entries).toEqual([]);
    expect((await readLog(`keyId=${key.id}&to=${Date.now() + 60_000}`)).body.entries).toHaveLength(3);
  });

  it("exports CSV (RFC 4180) with a header row and one line per entry", async () => {
    const response = await readLog(`keyId=${key.id}&format=csv`);
    expect(response.headers["content-type"]).toMatch(/^text\/csv/);
    const lines = response.text.trim().split("\r\n");
    expect(lines[0]).toBe("id,at,keyId,keyPrefix,teamId,method,route,status,durationMs,evaluations,cosmologyHash,cosmologyRef,clientAddress");
    expect(lines).toHaveLength(4);
  });

  it("keeps an auditor to their team: another team's log reads empty (OWASP API1)", async () => {
    // A call by another team (the tests' own key belongs to the http-tests team), so that the log holds one.
    expect((await api().get("/api/v1/distances?z=0.5&cosmology=planck18").set(keyHeader())).status).toBe(200);
    const response = await readLog("teamId=team_of_someone_else");
    expect(response.status).toBe(200);
    expect(response.body.entries).toEqual([]);
    const everything = await readLog("limit=500");
    expect(everything.body.entries.every((e: { teamId: string }) => e.teamId === "team_lantern_ridge")).toBe(true);
    const forAdmin = await readLog("limit=500", "administrator");
    expect(forAdmin.body.entries.some((e: { teamId: string }) => e.teamId !== "team_lantern_ridge")).toBe(true);
  });
});

describe("secrets stay secret", () => {
  it("no key secret, password or token in the request log, the audit trail or the server output", async () => {
    const db = database();
    const dump = JSON.stringify([
      (await db.execute("select * from request_log")).rows,
      (await db.execute("select * from audit_trail")).rows,
      (await db.execute("select * from api_keys")).rows,
    ]);
    db.close();
    const output = readFileSync(inject("serverLogFile"), "utf8");
    for (const secret of [key.secret, inject("computeKey"), WRONG_PASSWORD]) {
      expect(dump).not.toContain(secret);
      expect(output).not.toContain(secret);
    }
    // The demo password is printed at start on purpose (DEMO), but is never stored.
    expect(dump).not.toContain("starlight-demo");
    expect(dump).toMatch(/cmv_[0-9a-z]{6}/); // the visible prefixes are there: the scan looks at real rows
  });
});
