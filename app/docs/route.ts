import { ApiReference } from "@scalar/nextjs-api-reference";

// Everything is served from this server: the bundle from public/scalar/, no web fonts, no telemetry.
export const GET = ApiReference({
  url: "/api/v1/openapi.json",
  cdn: "/scalar/standalone.js",
  withDefaultFonts: false,
  telemetry: false,
  pageTitle: "Comova API reference",
  metaData: { title: "Comova API reference" },
});
