// Shared helpers of the HTTP tests: a supertest agent on the real server started by global-setup.ts.
import request from "supertest";
import { inject } from "vitest";

export function api() {
  return request(inject("baseUrl"));
}

/** `Authorization: Bearer <key>` for the compute routes: the tests' own key unless another is given. */
export function keyHeader(key: string = inject("computeKey")): Record<string, string> {
  return { Authorization: `Bearer ${key}` };
}
