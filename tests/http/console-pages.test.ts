// The console pages check the role on the server: a page the role may not open redirects to the keys
// page, which names the missing permission; the pages a role may open render.
import { describe, expect, it } from "vitest";
import { session } from "../access/http-helpers";
import { api } from "./support";

type Role = "administrator" | "manager" | "auditor" | "member";
const consoleCookie = async (role: Role) => (await session(role)).replace("comova_api_session=", "comova_session=");

async function open(path: string, role: Role) {
  return api().get(path).set("Cookie", await consoleCookie(role)).redirects(0);
}

const PAGES: [path: string, permission: string, allowed: Role[]][] = [
  ["/console/members", "members:read", ["administrator", "manager", "auditor"]],
  ["/console/usage", "usage:read", ["administrator", "manager", "auditor", "member"]],
  ["/console/log", "request-log:read", ["administrator", "auditor"]],
  ["/console/audit", "audit-trail:read", ["administrator", "auditor"]],
  ["/console/outbox", "outbox:read", ["administrator"]],
];
const ROLES: Role[] = ["administrator", "manager", "auditor", "member"];

describe("console pages and roles", () => {
  for (const [path, permission, allowed] of PAGES) {
    it(`${path} opens for ${allowed.join(", ")} and sends the others to the keys page`, async () => {
      for (const role of ROLES) {
        const response = await open(path, role);
        if (allowed.includes(role)) {
          expect(response.status, `${role} ${path}`).toBe(200);
        } else {
          expect([303, 307], `${role} ${path}`).toContain(response.status);
          expect(response.headers.location).toBe(`/console?refused=${encodeURIComponent(permission)}`);
        }
      }
    });
  }

  it("says on the keys page which permission was missing", async () => {
    const page = await open("/console?refused=request-log%3Aread", "member");
    expect(page.status).toBe(200);
    expect(page.text).toContain("Your role (member) cannot open that page");
    expect(page.text).toContain("request-log:read");
  });

  it("sends a signed-out visitor of every page to the sign-in page", async () => {
    for (const [path] of PAGES) {
      const response = await api().get(path).redirects(0);
      expect([303, 307]).toContain(response.status);
      expect(response.headers.location).toContain("/console/sign-in");
    }
  });
});
