// The problem+json responses and the helper that registers a compute endpoint for GET and POST.
import type { ZodObject } from "zod";
import { problemSchema } from "./common";
import { LIMITS_DESCRIPTION } from "./limits";
import { registry } from "./registry";
import type { z } from "./zod";

export const BEARER = "bearerKey";

const PROBLEM_MEANINGS: Record<number, string> = {
  400: "Malformed JSON body.",
  401: "Missing or unknown API key.",
  403: "The key lacks the scope this endpoint needs.",
  404: "Unknown cosmology profile, or a profile of another team.",
  409: "The slug is taken by a preset.",
  413: "Body larger than the limit stated in `detail`.",
  415: "Unsupported Content-Type.",
  422: "Invalid parameters: `errors` names each one (wrong type, z < 0, NaN, empty or over-long list, bad unit, both a named and an inline cosmology, no big bang…).",
  429: "Burst limit reached, or the key's monthly evaluation units are spent: `limit` says which (`burst` or `monthly`); retry after `Retry-After` seconds.",
};

export function problemResponses(statuses: number[]) {
  return Object.fromEntries(
    statuses.map((status) => [
      String(status),
      { description: PROBLEM_MEANINGS[status], content: { "application/problem+json": { schema: problemSchema } } },
    ]),
  );
}

export const COMPUTE_PROBLEMS = [400, 401, 403, 404, 413, 415, 422, 429];

interface ComputeOperation {
  path: string;
  tag: string;
  summary: string;
  description: string;
  input: ZodObject;
  answer: z.ZodType;
  example: Record<string, unknown>;
}

/** One compute endpoint: GET with the fields as query parameters, POST with the same fields as a JSON body. */
export function registerComputeOperation(op: ComputeOperation): void {
  const common = {
    path: op.path,
    tags: [op.tag],
    security: [{ [BEARER]: [] }],
    responses: {
      "200": {
        description: "The answer envelope: resolved cosmology, units, engine version and columnar results.",
        headers: { "Server-Timing": { description: "Time spent computing and serializing on the server.", schema: { type: "string" as const } } },
        content: { "application/json": { schema: op.answer } },
      },
      ...problemResponses(COMPUTE_PROBLEMS),
    },
  };
  const query = new URLSearchParams(
    Object.entries(op.example).map(([k, v]) => [k, Array.isArray(v) ? v.join(",") : String(v)]),
  ).toString();
  registry.registerPath({
    ...common,
    method: "get",
    operationId: `${op.tag}Get`,
    summary: `${op.summary} (query string)`,
    description: `${op.description}\n\nExample: \`GET ${op.path}?${decodeURIComponent(query)}\`\n\n${LIMITS_DESCRIPTION}`,
    request: { query: op.input },
  });
  registry.registerPath({
    ...common,
    method: "post",
    operationId: `${op.tag}Post`,
    summary: `${op.summary} (JSON body)`,
    description: `${op.description}\n\n${LIMITS_DESCRIPTION}`,
    request: { body: { required: true, content: { "application/json": { schema: op.input, example: op.example } } } },
  });
}
