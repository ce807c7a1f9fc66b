import { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";

/** Every path and schema of the public API is registered here by the modules of openapi/. */
export const registry = new OpenAPIRegistry();
