// The console pages (sign-in, the signed-in landing with the user's team keys) and the demo key.
import { readFileSync } from "node:fs";
import { describe, expect, inject, it } from "vitest";
import { session } from "../access/http-helpers";
import { api, keyHeader } from "./support";

const consoleCookie = async (role: "manager" | "member") => (await session(role)).replace("comova_api_session=", "comova_session=");

describe("console", () => {
  it("sends a signed-out visitor to the sign-in page, which has an e-mail and password form", async () => {
    const landing = await api().get("/console");
    expect([303, 307]).toContain(landing.status);
    expect(landing.headers.location).toContain("/console/sign-in");
    const page = await api().get("/console/sign-in");
    expect(page.status).toBe(200);
    expect(page.text).toContain('name="email"');
    expect(page.text).toContain('type="password"');
  });

  it("lists the team's keys by prefix for a manager, never a secret, and only the member's own for a member", async () => {
    const manager = await api().get("/console").set("Cookie", await consoleCookie("manager"));
    expect(manager.status).toBe(200);
    expect(manager.text).toContain("Kwame Oduya");
    expect(manager.text).toContain("Demo key");
    expect(manager.text).not.toMatch(/cmv_[0-9a-z]{38}/);
    const member = await api().get("/console").set("Cookie", await consoleCookie("member"));
    expect(member.text).toContain("Signe Lindqvist");
  });

  it("does not take the API's Strict cookie for the console (Path and name differ)", async () => {
    const response = await api().get("/console").set("Cookie", await session("manager"));
    expect([303, 307]).toContain(response.status);
  });
});

describe("demo API key", () => {
  it("is printed at start and works for the demo member's team", async () => {
    const line = readFileSync(inject("serverLogFile"), "utf8").split("\n").find((l) => l.includes("demo API key"))!;
    const secret = line.match(/cmv_[0-9a-z]{38}/)![0];
    const response = await api().get("/api/v1/distances?z=0.5&cosmology=planck18").set(keyHeader(secret));
    expect(response.status).toBe(200);
    const log = await api().get("/api/v1/admin/request-log?keyId=key_demo_member&limit=1").set("Cookie", await session("auditor"));
    expect(log.body.entries[0]).toMatchObject({ teamId: "team_lantern_ridge", status: 200 });
  });
});
