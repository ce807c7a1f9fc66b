// Usage summaries per key, team and day, each role seeing what the permission table allows.
import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_MONTHLY_UNITS } from "@/api-core/access/types";
import { session, unique } from "../access/http-helpers";
import { api, keyHeader } from "./support";

let managerKey = "";
let memberKey = "";
beforeAll(async () => {
  const manager = await api().post("/api/v1/admin/keys").set("Cookie", await session("manager")).send({ name: unique("usage") });
  const member = await api().post("/api/v1/admin/keys").set("Cookie", await session("member")).send({ name: unique("mine") });
  managerKey = manager.body.key.id;
  memberKey = member.body.key.id;
  await api().post("/api/v1/distances").set(keyHeader(manager.body.secret)).send({ z: [0.1, 0.2, 0.3, 0.4], cosmology: "planck18" });
  await api().get("/api/v1/distances?z=1&cosmology=planck18").set(keyHeader(member.body.secret));
});

const usage = async (role: "administrator" | "manager" | "auditor" | "member", query = "") => api().get(`/api/v1/admin/usage?${query}`).set("Cookie", await session(role));

describe("usage summary", () => {
  it("counts units per key this month, per team, and calls and evaluations per day", async () => {
    const response = await usage("auditor", `keyId=${managerKey}`);
    expect(response.status).toBe(200);
    expect(response.body.month).toBe(new Date().toISOString().slice(0, 7));
    expect(response.body.keys).toEqual([expect.objectContaining({ keyId: managerKey, units: 4, monthlyUnits: DEFAULT_MONTHLY_UNITS })]);
    expect(response.body.teams).toEqual([{ teamId: "team_lantern_ridge", units: 4 }]);
    expect(response.body.days).toEqual([{ day: new Date().toISOString().slice(0, 10), requests: 1, evaluations: 4 }]);
  });

  it("shows a member only their own keys", async () => {
    const ids = (await usage("member")).body.keys.map((k: { keyId: string }) => k.keyId);
    expect(ids).toContain(memberKey);
    expect(ids).not.toContain(managerKey);
  });

  it("keeps a manager to their team and lets an administrator see every team", async () => {
    expect((await usage("manager", "teamId=team_of_someone_else")).body.keys).toEqual([]);
    const teams = (await usage("administrator")).body.teams.map((t: { teamId: string }) => t.teamId);
    expect(teams).toContain("team_lantern_ridge");
    expect(teams.length).toBeGreaterThan(1);
  });

  it("reads an empty past month and refuses a malformed one with 422", async () => {
    expect((await usage("manager", `keyId=${managerKey}&month=2020-01`)).body).toMatchObject({ month: "2020-01", keys: [expect.objectContaining({ units: 0 })], days: [] });
    const bad = await usage("manager", "month=2026-13");
    expect(bad.status).toBe(422);
    expect(bad.body.errors[0].parameter).toBe("month");
  });
});
