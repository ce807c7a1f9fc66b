// The team console in a real browser against the built server: keys issued, used, seen in usage and
// the log, revoked; an invitation reaching the administrator's outbox; a member refused the pages
// of other roles. Every request the pages make stays on this host.
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO, DEMO_PASSWORD, unique } from "../access/http-helpers";

const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
const SECRET = /^cmv_[0-9a-hjkmnp-tv-z]{38}$/;

describe("team console in a browser", () => {
  let browser: Browser;
  const contexts: BrowserContext[] = [];
  const hosts = new Set<string>();
  const keyName = unique("browser key");
  let secret = "";

  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ARGS });
  });
  afterAll(async () => {
    await browser?.close();
  });

  /** A fresh browser profile signed in through the sign-in form. */
  async function signedIn(email: string): Promise<Page> {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    contexts.push(context);
    context.on("request", (request) => {
      const url = new URL(request.url());
      if (["http:", "https:", "ws:", "wss:"].includes(url.protocol)) hosts.add(url.hostname);
    });
    const page = await context.newPage();
    await page.goto(`${inject("baseUrl")}/console/sign-in`);
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/console$/);
    return page;
  }

  const go = (page: Page, path: string) => page.goto(`${inject("baseUrl")}${path}`);
  const distances = (key: string) => fetch(`${inject("baseUrl")}/api/v1/distances?z=0.5&cosmology=planck18`, { headers: { Authorization: `Bearer ${key}` } });

  it("lets a manager issue a key whose secret is shown once and works", async () => {
    const page = await signedIn(DEMO.manager);
    const bar = page.getByRole("banner");
    expect(await bar.innerText()).toMatch(/Kwame Oduya\s+manager/);
    await page.getByRole("table", { name: "API keys" }).getByText("Demo key").waitFor();
    await page.screenshot({ path: "/tmp/console-keys.png", fullPage: true });

    await page.getByRole("button", { name: "Issue a key" }).click();
    const form = page.getByRole("form", { name: "Issue a key" });
    await form.getByLabel("Name").fill(keyName);
    await form.getByLabel("Monthly units").fill("5000");
    await form.getByRole("button", { name: "Issue key" }).click();
    secret = (await page.getByTestId("secret").innerText()).trim();
    expect(secret).toMatch(SECRET);
    await page.getByText("this is the only time it is shown").waitFor();
    const row = page.getByRole("row", { name: new RegExp(keyName) });
    await row.waitFor();
    expect(await row.innerText()).toMatch(/0 \/ 5,000/);
    await page.screenshot({ path: "/tmp/console-key-issued.png", fullPage: true });

    await page.getByRole("button", { name: "I have stored it" }).click();
    await page.reload();
    await row.waitFor();
    expect(await page.content()).not.toContain(secret);

    expect((await distances(secret)).status).toBe(200);
  });

  it("shows the call in the manager's usage: the day's bar and the key's units", async () => {
    const page = await signedIn(DEMO.manager);
    await go(page, "/console/usage");
    const row = page.getByRole("table", { name: "Usage per key" }).getByRole("row", { name: new RegExp(keyName) });
    await row.waitFor();
    expect(await row.innerText()).toMatch(/\b1\b[\s\S]*5,000/);
    expect(await page.locator(".recharts-bar-rectangle path").count()).toBeGreaterThan(0);
    await page.screenshot({ path: "/tmp/console-usage.png", fullPage: true });

    // The month before: the key existed but used nothing then.
    const now = new Date();
    const lastMonth = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - 1, 1)).toISOString().slice(0, 7);
    await page.getByLabel("Month").fill(lastMonth);
    await page.getByText(`Evaluations per day, ${lastMonth}`).waitFor();
    await page.getByText("0 units in all").waitFor();
    expect(await row.innerText()).toMatch(/\b0\b[\s\S]*5,000/);
  });

  it("shows the call in the auditor's request log with its cosmology, filtered by key, and exports it as CSV", async () => {
    const page = await signedIn(DEMO.auditor);
    await go(page, "/console/log");
    const keySelect = page.getByRole("combobox", { name: /^Key/ });
    const option = keySelect.locator("option", { hasText: keyName });
    await option.waitFor({ state: "attached" });
    await keySelect.selectOption((await option.getAttribute("value"))!);
    await page.getByRole("button", { name: "Apply" }).click();
    const rows = page.getByRole("table", { name: "Request log" }).getByRole("row");
    await rows.nth(1).getByText("/api/v1/distances").waitFor();
    expect(await rows.count()).toBe(2);
    expect(await rows.nth(1).innerText()).toMatch(/200[\s\S]*planck18@\d+\s+sha256:/);
    await page.screenshot({ path: "/tmp/console-log.png", fullPage: true });

    const csv = await page.request.get(`${inject("baseUrl")}${await page.getByRole("link", { name: "Export CSV" }).getAttribute("href")}`);
    expect(csv.status()).toBe(200);
    const lines = (await csv.text()).trim().split(/\r?\n/);
    expect(lines[0]).toContain("cosmologyHash");
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(secret.slice(0, 10));

    await go(page, "/console/audit");
    await page.getByRole("table", { name: "Audit trail" }).getByText("key.issued").first().waitFor();
    await page.screenshot({ path: "/tmp/console-audit.png", fullPage: true });
  });

  it("revokes the key after a confirmation, and the key then answers 401", async () => {
    const page = await signedIn(DEMO.manager);
    const row = page.getByRole("row", { name: new RegExp(keyName) });
    await row.getByRole("button", { name: "Revoke…" }).click();
    await row.getByText("now?").waitFor();
    expect((await distances(secret)).status).toBe(200);
    await row.getByRole("button", { name: "Revoke", exact: true }).click();
    await row.getByText("revoked").waitFor();
    expect(await row.getByRole("button", { name: "Rotate…" }).count()).toBe(0);
    expect((await distances(secret)).status).toBe(401);
  });

  it("rotates a key and shows the new secret once; both secrets work during the overlap", async () => {
    const page = await signedIn(DEMO.manager);
    const name = unique("rotated key");
    await page.getByRole("button", { name: "Issue a key" }).click();
    await page.getByRole("form", { name: "Issue a key" }).getByLabel("Name").fill(name);
    await page.getByRole("button", { name: "Issue key" }).click();
    const first = (await page.getByTestId("secret").innerText()).trim();
    const row = page.getByRole("row", { name: new RegExp(name) });
    await row.getByRole("button", { name: "Rotate…" }).click();
    await row.getByRole("button", { name: "Rotate", exact: true }).click();
    await page.getByText(`New secret of ${name}`).waitFor();
    const second = (await page.getByTestId("secret").innerText()).trim();
    await page.getByRole("row", { name: /rotated: works until it expires/ }).waitFor();
    expect(second).toMatch(SECRET);
    expect(second).not.toBe(first);
    expect((await distances(first)).status).toBe(200);
    expect((await distances(second)).status).toBe(200);
  });

  it("lets a manager invite by e-mail and change the invitee's role; the administrator reads the mail in the outbox", async () => {
    const page = await signedIn(DEMO.manager);
    const email = `${unique("invitee")}@lantern-ridge.example`;
    await go(page, "/console/members");
    const form = page.getByRole("form", { name: "Invite a member" });
    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("Role").selectOption("auditor");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.getByRole("status").getByText(`Invitation sent to ${email}`).waitFor();
    const invitation = page.getByRole("table", { name: "Invitations" }).getByRole("row", { name: new RegExp(email) });
    expect(await invitation.innerText()).toMatch(/auditor[\s\S]*waiting/);
    const member = page.getByRole("table", { name: "Members" }).getByRole("row", { name: new RegExp(email) });
    expect(await member.innerText()).toContain("invited, not joined yet");
    await member.getByRole("combobox").selectOption("member");
    await page.reload();
    expect(await page.getByRole("table", { name: "Members" }).getByRole("row", { name: new RegExp(email) }).getByRole("combobox").inputValue()).toBe("member");
    await page.screenshot({ path: "/tmp/console-members.png", fullPage: true });

    const admin = await signedIn(DEMO.administrator);
    await go(admin, "/console/outbox");
    const mail = admin.getByRole("row", { name: new RegExp(email) });
    await mail.locator("summary").click();
    expect(await mail.innerText()).toMatch(/\/console\/accept-invitation\?token=/);
    await admin.screenshot({ path: "/tmp/console-outbox.png", fullPage: true });

    await admin.getByRole("combobox", { name: "Team" }).selectOption({ label: "Lantern Ridge Redshift Survey" });
    await go(admin, "/console");
    await admin.getByRole("table", { name: "API keys" }).getByText("Demo key").waitFor();
    // The picked team is remembered across pages, and with it issuing is possible.
    await admin.getByRole("button", { name: "Issue a key" }).waitFor();
    expect(await admin.getByRole("combobox", { name: "Team" }).inputValue()).toBe("team_lantern_ridge");
    await admin.screenshot({ path: "/tmp/console-admin-keys.png", fullPage: true });
  });

  it("refuses a member the members and log pages on the server, and hides their links", async () => {
    const page = await signedIn(DEMO.member);
    const links = await page.getByRole("navigation", { name: "Console" }).getByRole("link").allInnerTexts();
    expect(links).toEqual(["Keys", "Usage"]);
    for (const [path, permission] of [["/console/members", "members:read"], ["/console/log", "request-log:read"]]) {
      await go(page, path);
      expect(new URL(page.url()).pathname).toBe("/console");
      await page.getByRole("alert").getByText(permission).waitFor();
    }
    await page.screenshot({ path: "/tmp/console-member-refused.png", fullPage: true });
    await page.setViewportSize({ width: 420, height: 800 });
    await page.screenshot({ path: "/tmp/console-narrow.png", fullPage: true });
    expect((await page.request.get(`${inject("baseUrl")}/api/v1/admin/members`)).status()).toBe(403);
    expect((await page.request.get(`${inject("baseUrl")}/api/v1/admin/request-log`)).status()).toBe(403);
  });

  it("made no request to any host but this one", () => {
    expect(contexts.length).toBeGreaterThan(0);
    expect([...hosts]).toEqual(["127.0.0.1"]);
  });
});
