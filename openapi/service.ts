// The unkeyed service endpoints: health and this document.
import { registry } from "./registry";
import { z } from "./zod";

export const HealthAnswer = z
  .object({
    status: z.enum(["ok", "degraded"]),
    version: z.string().openapi({ example: "0.1.0" }),
    database: z.object({ reachable: z.boolean() }),
  })
  .openapi("Health");

registry.registerPath({
  method: "get",
  path: "/api/v1/health",
  operationId: "health",
  tags: ["service"],
  summary: "Service health (no key)",
  security: [],
  responses: {
    "200": { description: "Up, database reachable.", content: { "application/json": { schema: HealthAnswer, example: { status: "ok", version: "0.1.0", database: { reachable: true } } } } },
    "503": { description: "Up, but the database is not reachable.", content: { "application/json": { schema: HealthAnswer } } },
  },
});

registry.registerPath({
  method: "get",
  path: "/api/v1/openapi.json",
  operationId: "openapi",
  tags: ["service"],
  summary: "This OpenAPI 3.1 document (no key)",
  security: [],
  responses: { "200": { description: "The document, generated from the same zod schemas that validate requests.", content: { "application/json": { schema: z.object({}).passthrough() } } } },
});
