// /docs renders the API reference with every asset served by Comova itself: no request leaves localhost.
import { chromium, type Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";

const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

describe("/docs in a browser", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ARGS });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("renders the Comova reference offline: endpoint names appear and no request goes to another host", async () => {
    const page = await browser.newPage();
    const hosts = new Set<string>();
    page.on("request", (request) => {
      const url = new URL(request.url());
      if (url.protocol === "http:" || url.protocol === "https:" || url.protocol === "ws:" || url.protocol === "wss:") hosts.add(url.hostname);
    });
    await page.goto(`${inject("baseUrl")}/docs`, { waitUntil: "networkidle" });
    await page.getByText("Cosmological distances").first().waitFor({ timeout: 30_000 });
    await page.getByText("catalogs").first().waitFor({ timeout: 10_000 });
    expect(await page.title()).toBe("Comova API reference");
    await page.screenshot({ path: "/tmp/comova-docs.png" });
    expect([...hosts].filter((host) => host !== "127.0.0.1" && host !== "localhost")).toEqual([]);
    expect(hosts.size).toBeGreaterThan(0);
  });
});
