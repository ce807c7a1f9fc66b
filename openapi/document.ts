// Builds the OpenAPI 3.1 document from the registry that every schema module fills in.
import { OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { SERVICE_VERSION } from "@/api-core/http/version";
import { LIMITS_DESCRIPTION } from "./limits";
import { registry } from "./registry";
import { BEARER } from "./responses";
// Imported for their registrations on the shared registry.
import "./compute";
import "./cosmologies";
import "./catalogs";
import "./service";
import "./admin";

registry.registerComponent("securitySchemes", BEARER, {
  type: "http",
  scheme: "bearer",
  description: "An API key of your team: `Authorization: Bearer <key>`. Keys are created in the console or with `npm run admin -- create-key`.",
});

let document: ReturnType<OpenApiGeneratorV31["generateDocument"]> | undefined;

export function openApiDocument() {
  document ??= new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: {
      title: "Comova API",
      version: SERVICE_VERSION,
      description:
        "Cosmological distances, times, volumes and expansion history for single redshifts and whole survey catalogs. " +
        "Every answer carries the resolved cosmology (parameters, derived densities, a sha256 content hash and the profile reference), " +
        "its units and the engine version, so that a catalog records how its numbers were made. Errors are RFC 9457 application/problem+json.\n\n" +
        LIMITS_DESCRIPTION,
      license: { name: "Proprietary" },
    },
    servers: [{ url: "/" }],
    security: [{ [BEARER]: [] }],
  });
  return document;
}
