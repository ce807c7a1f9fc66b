// Console sessions over HTTP (OWASP API2: broken authentication).
import { readFileSync } from "node:fs";
import path from "node:path";
import { SignJWT } from "jose";
import { describe, expect, inject, it } from "vitest";
import { DEMO, session, unique } from "../access/http-helpers";
import { api } from "./support";

const secretOfServer = () => readFileSync(path.join(path.dirname(inject("databaseUrl").slice(5)), "session-secret"), "utf8");
const token = (secret: string, claims: { sub: string; exp: number }) =>
  new SignJWT({}).setProtectedHeader({ alg: "HS256" }).setSubject(claims.sub).setIssuer("comova").setAudience("comova-console").setIssuedAt().setExpirationTime(claims.exp).sign(new TextEncoder().encode(secret));
const asCookie = (value: string) => `comova_api_session=${value}`;

describe("sign-in", () => {
  it("sets httpOnly session cookies, Strict for the API and Lax for the console, without Secure over http", async () => {
    const response = await api().post("/api/v1/admin/session").send({ email: DEMO.manager, password: "starlight-demo" });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ email: DEMO.manager, role: "manager", teamId: "team_lantern_ridge" });
    expect(JSON.stringify(response.body)).not.toMatch(/password|scrypt/i);
    const cookies = response.headers["set-cookie"] as unknown as string[];
    expect(cookies.find((c) => c.startsWith("comova_api_session="))).toMatch(/Path=\/api\/v1\/admin; SameSite=Strict; HttpOnly; Max-Age=28800$/);
    expect(cookies.find((c) => c.startsWith("comova_session="))).toMatch(/Path=\/console; SameSite=Lax; HttpOnly; Max-Age=28800$/);
  });

  it("sets Secure when the original request came over https", async () => {
    const response = await api().post("/api/v1/admin/session").set("X-Forwarded-Proto", "https").send({ email: DEMO.member, password: "starlight-demo" });
    expect((response.headers["set-cookie"] as unknown as string[]).every((c) => c.endsWith("; Secure"))).toBe(true);
  });

  it("refuses a wrong password with 401 and the same answer as an unknown e-mail", async () => {
    const wrong = await api().post("/api/v1/admin/session").set("X-Forwarded-For", "203.0.113.7").send({ email: DEMO.auditor, password: "not-it" });
    const unknown = await api().post("/api/v1/admin/session").set("X-Forwarded-For", "203.0.113.7").send({ email: "nobody@lantern-ridge.example", password: "not-it" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body.detail).toBe(wrong.body.detail);
  });

  it("throttles failed sign-ins per e-mail: the 6th attempt is 429 with Retry-After, even with the right password", async () => {
    const email = `${unique("victim")}@example.org`;
    for (let attempt = 1; attempt <= 5; attempt++) {
      const response = await api().post("/api/v1/admin/session").set("X-Forwarded-For", `192.0.2.${attempt}`).send({ email, password: "guess" });
      expect(response.status).toBe(401);
    }
    const blocked = await api().post("/api/v1/admin/session").set("X-Forwarded-For", "192.0.2.99").send({ email, password: "guess" });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers["retry-after"])).toBeGreaterThan(0);
    expect(blocked.headers["content-type"]).toMatch(/^application\/problem\+json/);
    expect(blocked.body.detail).toMatch(/wait \d+ s/);
  });

  it("throttles failed sign-ins per client address across e-mails", async () => {
    const address = "198.18.0.77";
    let last = 0;
    for (let attempt = 0; attempt < 31; attempt++) {
      last = (await api().post("/api/v1/admin/session").set("X-Forwarded-For", address).send({ email: `${unique("probe")}@example.org`, password: "x" })).status;
    }
    expect(last).toBe(429);
  });

  it("signs out by clearing both cookies", async () => {
    const response = await api().delete("/api/v1/admin/session");
    expect(response.status).toBe(204);
    expect((response.headers["set-cookie"] as unknown as string[]).every((c) => c.includes("Max-Age=0"))).toBe(true);
  });
});

describe("session tokens presented to the admin API", () => {
  it("accepts the server's own token", async () => {
    expect((await api().get("/api/v1/admin/session").set("Cookie", await session("member"))).body.user.email).toBe(DEMO.member);
  });

  it("rejects a tampered token (payload swapped to the administrator)", async () => {
    const [header, , signature] = (await session("member")).split("=")[1].split(".");
    const payload = Buffer.from(JSON.stringify({ sub: "user_demo_admin", iss: "comova", aud: "comova-console", exp: Math.floor(Date.now() / 1000) + 3600 })).toString("base64url");
    expect((await api().get("/api/v1/admin/teams").set("Cookie", asCookie(`${header}.${payload}.${signature}`))).status).toBe(401);
  });

  it("rejects an expired token signed with the server's secret", async () => {
    const expired = await token(secretOfServer(), { sub: "user_demo_admin", exp: Math.floor(Date.now() / 1000) - 60 });
    expect((await api().get("/api/v1/admin/teams").set("Cookie", asCookie(expired))).status).toBe(401);
  });

  it("rejects a token signed with another secret", async () => {
    const foreign = await token("a-secret-that-is-not-this-servers-secret", { sub: "user_demo_admin", exp: Math.floor(Date.now() / 1000) + 3600 });
    expect((await api().get("/api/v1/admin/teams").set("Cookie", asCookie(foreign))).status).toBe(401);
  });

  it("proves the signing path: a fresh token signed with the server's secret is accepted", async () => {
    const valid = await token(secretOfServer(), { sub: "user_demo_admin", exp: Math.floor(Date.now() / 1000) + 3600 });
    expect((await api().get("/api/v1/admin/teams").set("Cookie", asCookie(valid))).status).toBe(200);
  });
});
