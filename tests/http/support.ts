// Shared helpers of the HTTP tests: a supertest agent on the real server started by global-setup.ts.
import request from "supertest";
import { inject } from "vitest";

export function api() {
  return request(inject("baseUrl"));
}
