import { readdirSync } from "node:fs";
import path from "node:path";
import { Validator } from "@seriousme/openapi-schema-validator";
import { beforeAll, describe, expect, it } from "vitest";
import { api } from "./support";

/** Every route.ts under app/api/v1, as an OpenAPI path ([slug] → {slug}). */
function routePaths(folder = path.resolve("app/api/v1")): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return routePaths(full);
    if (entry.name !== "route.ts") return [];
    return ["/" + path.relative(path.resolve("app"), path.dirname(full)).split(path.sep).join("/").replace(/\[([^\]]+)\]/g, "{$1}")];
  });
}

type Operation = { parameters?: { example?: unknown; schema?: { example?: unknown } }[]; requestBody?: { content: Record<string, { example?: unknown; schema?: { example?: unknown } }> }; responses: Record<string, { content?: Record<string, unknown> }> };

describe("/api/v1/openapi.json", () => {
  let document: { openapi: string; paths: Record<string, Record<string, Operation>>; components: { securitySchemes: Record<string, unknown> }; info: { description: string } };
  beforeAll(async () => {
    const response = await api().get("/api/v1/openapi.json");
    expect(response.status).toBe(200);
    document = response.body;
  });

  it("is a valid OpenAPI 3.1 document (@seriousme/openapi-schema-validator)", async () => {
    const result = await new Validator().validate(document as never);
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
    expect(document.openapi).toMatch(/^3\.1\./);
  });

  it("documents every route.ts under app/api/v1", () => {
    const routes = routePaths();
    expect(routes).toContain("/api/v1/distances");
    expect(routes).toContain("/api/v1/cosmologies/{slug}");
    const missing = routes.filter((route) => !(route in document.paths));
    expect(missing).toEqual([]);
  });

  it("declares the bearer scheme, the limits and problem+json answers, with an example for every endpoint", () => {
    expect(document.components.securitySchemes.bearerKey).toMatchObject({ type: "http", scheme: "bearer" });
    expect(document.info.description).toContain("1,000,000 redshifts per POST call");
    for (const path of ["/api/v1/distances", "/api/v1/lookback-time", "/api/v1/angular-size", "/api/v1/volumes", "/api/v1/expansion", "/api/v1/redshifts"]) {
      const { get, post } = document.paths[path];
      expect(get.parameters!.every((p) => p.example !== undefined || p.schema?.example !== undefined), path).toBe(true);
      expect(post.requestBody!.content["application/json"].example, path).toBeDefined();
      expect(Object.keys(post.responses)).toEqual(expect.arrayContaining(["200", "400", "404", "413", "415", "422"]));
      expect(post.responses["422"].content).toHaveProperty(["application/problem+json"]);
    }
    expect(document.paths["/api/v1/catalogs"].post.requestBody!.content).toHaveProperty(["text/csv"]);
    expect(document.paths["/api/v1/cosmologies"].post.requestBody!.content["application/json"].example).toBeDefined();
  });
});
