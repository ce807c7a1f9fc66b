// The audit trail of console actions: who, what, when; append-only (the database refuses changes).
import { describe, expect, it } from "vitest";
import { database, session, unique } from "../access/http-helpers";
import { api } from "./support";

const trail = async (query = "") => (await api().get(`/api/v1/admin/audit-trail?${query}`).set("Cookie", await session("auditor"))).body.entries as {
  id: number; action: string; actorEmail: string | null; targetId: string; teamId: string; at: number; detail: Record<string, unknown>;
}[];

describe("audit trail", () => {
  it("records key issued, rotated and revoked, and a role change, with who and when", async () => {
    const manager = await session("manager");
    const started = Date.now();
    const issued = await api().post("/api/v1/admin/keys").set("Cookie", manager).send({ name: unique("audited") });
    const keyId = issued.body.key.id;
    await api().post(`/api/v1/admin/keys/${keyId}/rotate`).set("Cookie", manager).send({ overlapSeconds: 0 });
    await api().post(`/api/v1/admin/keys/${issued.body.key.id}/revoke`).set("Cookie", manager);
    const invited = await api().post("/api/v1/admin/invitations").set("Cookie", manager).send({ email: `${unique("role")}@lantern-ridge.example`, role: "member" });
    const changed = await api().patch(`/api/v1/admin/members/${invited.body.userId}`).set("Cookie", manager).send({ role: "auditor" });
    expect(changed.status).toBe(200);

    const entries = await trail("limit=20");
    const forKey = entries.filter((e) => e.targetId === keyId).map((e) => e.action);
    expect(forKey).toEqual(["key.revoked", "key.rotated", "key.issued"]);
    const roleChange = entries.find((e) => e.action === "member.role-changed" && e.targetId === invited.body.userId)!;
    expect(roleChange).toMatchObject({ actorEmail: "oduya@lantern-ridge.example", teamId: "team_lantern_ridge", detail: { from: "member", to: "auditor" } });
    expect(entries.find((e) => e.action === "member.invited" && e.targetId === invited.body.userId)).toBeDefined();
    expect(roleChange.at).toBeGreaterThanOrEqual(started);
    expect(JSON.stringify(entries)).not.toContain(issued.body.secret);
  });

  it("filters by action and keeps an auditor to their team", async () => {
    expect((await trail("action=key.issued")).every((e) => e.action === "key.issued")).toBe(true);
    expect(await trail("teamId=team_of_someone_else")).toEqual([]);
  });

  it("cannot be changed or deleted, even directly in the database", async () => {
    const db = database();
    await expect(db.execute("update audit_trail set action = 'nothing'")).rejects.toThrow(/append-only/);
    await expect(db.execute("delete from audit_trail")).rejects.toThrow(/append-only/);
    const count = await db.execute("select count(*) as n from audit_trail");
    db.close();
    expect(Number(count.rows[0].n)).toBeGreaterThan(0);
  });
});
