import request from "supertest";
import { describe, expect, inject, it } from "vitest";

const api = () => request(inject("baseUrl"));

describe("GET /api/v1/health", () => {
  it("answers 200 with the version and a reachable database, without a key", async () => {
    const response = await api().get("/api/v1/health");
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ status: "ok", database: { reachable: true } });
    expect(response.body.version).toMatch(/^\d+\.\d+\.\d+/);
  });
});

describe("unknown API paths", () => {
  it.each(["/api/v1/nowhere", "/api/v2/distances", "/api/v1/distances/extra/segments"])(
    "%s answers 404 problem+json (RFC 9457 §3) with an actionable detail",
    async (path) => {
      const response = await api().post(path).send({});
      expect(response.status).toBe(404);
      expect(response.headers["content-type"]).toMatch(/^application\/problem\+json/);
      expect(response.body).toMatchObject({ status: 404, title: "Not found", instance: path });
      expect(response.body.type).toMatch(/^urn:comova:problem:/);
      expect(response.body.detail).toContain("/api/v1/openapi.json");
    },
  );
});

describe("landing page", () => {
  it("says what Comova is and links to the reference and the console", async () => {
    const response = await api().get("/");
    expect(response.status).toBe(200);
    expect(response.text).toContain("Comova");
    expect(response.text).toContain('href="/docs"');
    expect(response.text).toContain('href="/console"');
  });
});
