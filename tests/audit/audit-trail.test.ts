// The audit trail: recordAudit (for other areas, e.g. profile creation) and the append-only rule.
import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { listAudit, recordAudit } from "@/api-core/audit/audit-trail";
import { write } from "@/db/client";
import { useFreshDatabase } from "../access/fresh-database";

useFreshDatabase();

describe("audit trail", () => {
  it("records who did what to what, and lists newest first by team with a cursor", async () => {
    await recordAudit({ actor: { id: "key_1", email: "cmv_abc123" }, teamId: "team_a", action: "profile.created", targetType: "profile", targetId: "survey-lcdm@1" });
    await recordAudit({ actor: null, teamId: "team_b", action: "team.created", targetType: "team", targetId: "team_b" });
    await recordAudit({ actor: { id: "user_1", email: "m@example.org" }, teamId: "team_a", action: "key.issued", targetType: "api_key", targetId: "key_2", detail: { prefix: "cmv_x" } });
    const page = await listAudit({ teamId: "team_a" }, { limit: 1 });
    expect(page).toEqual([expect.objectContaining({ action: "key.issued", actorEmail: "m@example.org", detail: { prefix: "cmv_x" } })]);
    const next = await listAudit({ teamId: "team_a" }, { before: page[0].id, limit: 10 });
    expect(next.map((e) => e.action)).toEqual(["profile.created"]);
  });

  it("refuses UPDATE and DELETE (the database triggers)", async () => {
    const refused = { cause: expect.objectContaining({ message: expect.stringMatching(/append-only/) }) };
    await expect(write((d) => d.run(sql`update audit_trail set action = 'x'`))).rejects.toMatchObject(refused);
    await expect(write((d) => d.run(sql`delete from audit_trail`))).rejects.toMatchObject(refused);
    expect(await listAudit({}, { limit: 10 })).toHaveLength(3);
  });
});
