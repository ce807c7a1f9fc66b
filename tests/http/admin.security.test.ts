// Every role against every admin route (OWASP API5: broken function level authorization): the
// server refuses what the role may not do, with 403 problem+json, and signed-out callers with 401.
import { describe, expect, it } from "vitest";
import { session } from "../access/http-helpers";
import { api } from "./support";

type Role = "administrator" | "manager" | "auditor" | "member";
const ALL: Role[] = ["administrator", "manager", "auditor", "member"];

// Bodies are deliberately invalid (or ids unknown) where the route changes something, so an allowed
// call ends in 404/422 after the permission check, and nothing changes.
const ROUTES: { method: "get" | "post" | "patch"; path: string; body?: object; allowed: Role[] }[] = [
  { method: "get", path: "/api/v1/admin/session", allowed: ALL },
  { method: "get", path: "/api/v1/admin/teams", allowed: ALL },
  { method: "post", path: "/api/v1/admin/teams", body: { slug: "X" }, allowed: ["administrator"] },
  { method: "get", path: "/api/v1/admin/members", allowed: ["administrator", "manager", "auditor"] },
  { method: "patch", path: "/api/v1/admin/members/user_nobody", body: { role: "emperor" }, allowed: ["administrator", "manager"] },
  { method: "get", path: "/api/v1/admin/invitations", allowed: ["administrator", "manager"] },
  { method: "post", path: "/api/v1/admin/invitations", body: { email: "not-an-address" }, allowed: ["administrator", "manager"] },
  { method: "get", path: "/api/v1/admin/keys", allowed: ALL },
  { method: "post", path: "/api/v1/admin/keys", body: {}, allowed: ["administrator", "manager", "member"] },
  { method: "post", path: "/api/v1/admin/keys/key_nobody/revoke", allowed: ["administrator", "manager", "member"] },
  { method: "post", path: "/api/v1/admin/keys/key_nobody/rotate", body: {}, allowed: ["administrator", "manager", "member"] },
  { method: "get", path: "/api/v1/admin/usage", allowed: ALL },
  { method: "get", path: "/api/v1/admin/request-log", allowed: ["administrator", "auditor"] },
  { method: "get", path: "/api/v1/admin/request-log?format=csv", allowed: ["administrator", "auditor"] },
  { method: "get", path: "/api/v1/admin/audit-trail", allowed: ["administrator", "auditor"] },
  { method: "get", path: "/api/v1/admin/outbox", allowed: ["administrator"] },
];

const cases = ROUTES.flatMap((route) => ALL.map((role) => ({ ...route, role, expected: route.allowed.includes(role) ? "allowed" : "refused" })));

describe("admin routes × roles", () => {
  it.each(cases)("$method $path as $role is $expected", async ({ method, path, body, role, expected }) => {
    const response = await api()[method](path).set("Cookie", await session(role)).send(body);
    if (expected === "refused") {
      expect(response.status).toBe(403);
      expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
      expect(response.body.detail).toContain(`Your role (${role})`);
    } else {
      expect([200, 404, 422]).toContain(response.status);
    }
  });

  it.each(ROUTES)("$method $path without a session answers 401 problem+json (RFC 9457)", async ({ method, path, body }) => {
    const response = await api()[method](path).send(body);
    expect(response.status).toBe(401);
    expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
    expect(response.body.detail).toContain("Sign in");
  });

  it("does not accept the console's Lax cookie on the API (only the Strict one)", async () => {
    const cookie = (await session("administrator")).replace("comova_api_session=", "comova_session=");
    expect((await api().get("/api/v1/admin/teams").set("Cookie", cookie)).status).toBe(401);
  });
});
