import { ApiReference } from "@scalar/nextjs-api-reference";

// Everything is served from this server: the bundle from public/scalar/, no web fonts, no telemetry,
// and the features that call Scalar's hosted services (AI agent, MCP, developer tools) switched off.
export const GET = ApiReference({
  url: "/api/v1/openapi.json",
  cdn: "/scalar/standalone.js",
  withDefaultFonts: false,
  telemetry: false,
  agent: { disabled: true },
  mcp: { disabled: true },
  showDeveloperTools: "never",
  pageTitle: "Comova API reference",
  metaData: { title: "Comova API reference" },
});
