// The one zod instance of the public API, extended with `.openapi(...)` metadata. Every schema in
// openapi/ imports `z` from here so that the same object validates a request and documents it.
import { extendZodWithOpenApi } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";

extendZodWithOpenApi(z);

export { z };
