// Shared helpers of the HTTP tests: a supertest agent on the real server started by global-setup.ts.
import { request as httpRequest } from "node:http";
import request from "supertest";
import { inject } from "vitest";

export function api() {
  return request(inject("baseUrl"));
}

/** `Authorization: Bearer <key>` for the compute routes: the tests' own key unless another is given. */
export function keyHeader(key: string = inject("computeKey")): Record<string, string> {
  return { Authorization: `Bearer ${key}` };
}

/**
 * POSTs a body the server may refuse before reading it all (a 413): the answer is kept even when the
 * rest of the upload is cut off (EPIPE / ECONNRESET after the answer arrived).
 */
export function postOversized(path: string, headers: Record<string, string>, body: Buffer): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Record<string, unknown> }> {
  return new Promise((resolve, reject) => {
    let answered = false;
    const request = httpRequest(new URL(path, inject("baseUrl")), { method: "POST", headers: { ...headers, "content-length": String(body.length) } }, (response) => {
      answered = true;
      let text = "";
      response.setEncoding("utf8");
      response.on("data", (chunk) => (text += chunk));
      response.on("end", () => resolve({ status: response.statusCode!, headers: response.headers, body: JSON.parse(text) }));
      response.on("error", reject);
    });
    request.on("error", (error) => {
      if (!answered) reject(error);
    });
    request.end(body);
  });
}
