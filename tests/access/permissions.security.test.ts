// The permission table (OWASP API5: broken function level authorization; API1: object level).
import { describe, expect, it } from "vitest";
import { authorize } from "@/api-core/access/authorize";
import { canSee, PERMISSIONS, reachOf, type Permission } from "@/api-core/access/permissions";
import type { Role, SessionUser } from "@/api-core/access/types";

const user = (role: Role): SessionUser => ({ id: `u-${role}`, email: `${role}@x.example`, name: role, role, teamId: role === "administrator" ? null : "team-a" });

// What the product promises, written out independently of the table it checks.
const EXPECTED: Record<Permission, Record<Role, "all" | "team" | "own" | null>> = {
  "teams:create": { administrator: "all", manager: null, auditor: null, member: null },
  "teams:read": { administrator: "all", manager: "team", auditor: "team", member: "team" },
  "members:read": { administrator: "all", manager: "team", auditor: "team", member: null },
  "members:invite": { administrator: "all", manager: "team", auditor: null, member: null },
  "members:set-role": { administrator: "all", manager: "team", auditor: null, member: null },
  "keys:read": { administrator: "all", manager: "team", auditor: "team", member: "own" },
  "keys:manage": { administrator: "all", manager: "team", auditor: null, member: "own" },
  "usage:read": { administrator: "all", manager: "team", auditor: "team", member: "own" },
  "request-log:read": { administrator: "all", manager: null, auditor: "team", member: null },
  "audit-trail:read": { administrator: "all", manager: null, auditor: "team", member: null },
  "outbox:read": { administrator: "all", manager: null, auditor: null, member: null },
};

describe("permission table", () => {
  it("has exactly the promised permissions", () => {
    expect(Object.keys(PERMISSIONS).sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  const cases = Object.entries(EXPECTED).flatMap(([permission, roles]) =>
    Object.entries(roles).map(([role, reach]) => [permission as Permission, role as Role, reach] as const),
  );
  it.each(cases)("%s for %s reaches %s", (permission, role, reach) => {
    expect(reachOf(role, permission)).toBe(reach);
    if (reach === null) expect(() => authorize(user(role), permission)).toThrow(expect.objectContaining({ status: 403 }));
    else expect(authorize(user(role), permission)).toEqual(reach === "all" ? {} : reach === "team" ? { teamId: "team-a" } : { teamId: "team-a", userId: "u-" + role });
  });

  it("keeps another team's rows and another member's keys out of sight", () => {
    expect(canSee({ teamId: "team-a" }, { teamId: "team-b" })).toBe(false);
    expect(canSee({ teamId: "team-a", userId: "u1" }, { teamId: "team-a", userId: "u2" })).toBe(false);
    expect(canSee({ teamId: "team-a", userId: "u1" }, { teamId: "team-a", userId: "u1" })).toBe(true);
    expect(canSee({}, { teamId: "team-b" })).toBe(true);
  });
});
