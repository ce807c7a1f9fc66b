// Invitations by e-mail: delivered to the local outbox with a working single-use, expiring link.
import { describe, expect, inject, it } from "vitest";
import { database, session, signIn, unique } from "../access/http-helpers";
import { api } from "./support";

async function invite(email: string, role = "member") {
  const response = await api().post("/api/v1/admin/invitations").set("Cookie", await session("manager")).send({ email, name: "Ayla Ncube", role });
  expect(response.status).toBe(201);
  return response.body as { invitationId: string; userId: string; expiresAt: number };
}

async function linkFor(email: string): Promise<URL> {
  const outbox = await api().get("/api/v1/admin/outbox").set("Cookie", await session("administrator"));
  expect(outbox.status).toBe(200);
  const message = outbox.body.messages.find((m: { to: string }) => m.to === email);
  expect(message.subject).toContain("Lantern Ridge Redshift Survey");
  return new URL(message.text.match(/https?:\/\/\S+/)![0]);
}

const accept = (token: string, password = "a-long-passphrase-42") => api().post("/api/v1/admin/invitations/accept").send({ token, name: "Ayla Ncube", password });

describe("invitations", () => {
  it("e-mails a link to the accept page whose token works once; the new member can then sign in", async () => {
    const email = `${unique("ayla")}@lantern-ridge.example`;
    const { expiresAt } = await invite(email);
    expect(expiresAt - Date.now()).toBeGreaterThan(71 * 3600_000);
    const link = await linkFor(email);
    expect(link.origin).toBe(new URL(inject("baseUrl")).origin);
    expect(link.pathname).toBe("/console/accept-invitation");
    const page = await api().get(link.pathname + link.search);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Accept your invitation");
    const token = link.searchParams.get("token")!;

    const first = await accept(token);
    expect(first.status).toBe(200);
    expect(first.body.user).toMatchObject({ email, role: "member", teamId: "team_lantern_ridge" });
    expect((first.headers["set-cookie"] as unknown as string[]).some((c) => c.startsWith("comova_api_session="))).toBe(true);
    await signIn(email, "a-long-passphrase-42");

    const second = await accept(token, "another-passphrase-99");
    expect(second.status).toBe(409);
    expect(second.body.type).toBe("urn:comova:problem:invitation-used");
    await expect(signIn(email, "another-passphrase-99")).rejects.toThrow(/401/);
  });

  it("refuses an expired link (409) and leaves the account without a password", async () => {
    const email = `${unique("late")}@lantern-ridge.example`;
    const { invitationId, userId } = await invite(email, "auditor");
    const token = (await linkFor(email)).searchParams.get("token")!;
    const db = database();
    await db.execute({ sql: "update invitations set expires_at = ? where id = ?", args: [Date.now() - 1000, invitationId] });
    const response = await accept(token);
    const user = await db.execute({ sql: "select password_hash from users where id = ?", args: [userId] });
    db.close();
    expect(response.status).toBe(409);
    expect(response.body.type).toBe("urn:comova:problem:invitation-expired");
    expect(response.body.detail).toContain("ask your team manager");
    expect(user.rows[0].password_hash).toBeNull();
  });

  it("refuses an unknown token with 404 and a too-short password with 422", async () => {
    expect((await accept("x".repeat(43))).status).toBe(404);
    const email = `${unique("short")}@lantern-ridge.example`;
    await invite(email);
    const token = (await linkFor(email)).searchParams.get("token")!;
    const weak = await accept(token, "short");
    expect(weak.status).toBe(422);
    expect(weak.body.errors[0].parameter).toBe("password");
    expect((await accept(token)).status).toBe(200);
  });

  it("stores only a hash of the token", async () => {
    const email = `${unique("hash")}@lantern-ridge.example`;
    const { invitationId } = await invite(email);
    const token = (await linkFor(email)).searchParams.get("token")!;
    const db = database();
    const row = await db.execute({ sql: "select * from invitations where id = ?", args: [invitationId] });
    db.close();
    expect(JSON.stringify(row.rows[0])).not.toContain(token);
  });

  it("does not let a manager invite an administrator or into another team", async () => {
    const cookie = await session("manager");
    expect((await api().post("/api/v1/admin/invitations").set("Cookie", cookie).send({ email: "boss@example.org", role: "administrator" })).status).toBe(422);
    expect((await api().post("/api/v1/admin/invitations").set("Cookie", cookie).send({ email: "x@example.org", role: "member", teamId: "team_elsewhere" })).status).toBe(404);
  });
});
