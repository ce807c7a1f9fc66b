// From a web Request to a validated input: GET reads the query string (lists comma-separated),
// POST a JSON body with the same names. The zod schema given is the one that documents the endpoint.
import type { ZodObject, ZodType, output } from "zod";
import { ProblemError } from "@/api-core/http/problem";

export interface InputLimits {
  jsonBodyBytes: number;
  valuesPerQuery: number;
}

type FieldKind = "list" | "number" | "text";

function fieldKind(schema: ZodType | undefined): FieldKind {
  let def = schema?._zod.def as { type: string; innerType?: ZodType } | undefined;
  while (def && (def.type === "optional" || def.type === "default" || def.type === "nullable") && def.innerType) {
    def = def.innerType._zod.def as typeof def;
  }
  if (def?.type === "array") return "list";
  if (def?.type === "number") return "number";
  return "text";
}

const NUMBER = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$|^\s*[+-]?(Infinity|NaN)\s*$/;

/** A number when the text is one (NaN and Infinity included, so that zod names them); else the text, for zod to reject. */
function numberOrText(text: string): number | string {
  return NUMBER.test(text) ? Number(text) : text;
}

/** The query string as the object a JSON body would have given: lists split on commas, numbers as numbers. */
export function queryToObject(params: URLSearchParams, schema: ZodObject, maxValues: number): Record<string, unknown> {
  const result: Record<string, unknown> = {};
  for (const name of new Set(params.keys())) {
    const raw = params.getAll(name);
    const kind = fieldKind(schema.shape[name] as ZodType | undefined);
    if (kind === "list") {
      const items = raw.join(",") === "" ? [] : raw.join(",").split(",");
      if (items.length > maxValues) {
        throw new ProblemError(422, "too-many-values", `${name}: at most ${maxValues} values in a GET query; POST a JSON body for longer lists.`, {
          errors: [{ parameter: name, message: `at most ${maxValues} values in a query string` }],
        });
      }
      result[name] = items.map(numberOrText);
    } else {
      result[name] = kind === "number" ? numberOrText(raw[raw.length - 1]) : raw[raw.length - 1];
    }
  }
  return result;
}

/** Reads a JSON body within `maxBytes`: 415 unless it is JSON, 413 beyond the limit, 400 when malformed. */
export async function readJsonBody(request: Request, maxBytes: number): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/([a-z.+-]*\+)?json\b/i.test(type)) {
    throw new ProblemError(415, "unsupported-media-type", `Send the body as JSON with Content-Type: application/json (got ${type || "none"}), or use GET with a query string.`);
  }
  const text = await readText(request, maxBytes);
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new ProblemError(400, "malformed-json", `The body is not valid JSON: ${(error as Error).message}.`);
  }
}

export function tooLarge(maxBytes: number): ProblemError {
  const size = maxBytes >= 2 ** 20 ? ` (${maxBytes / 2 ** 20} MiB)` : "";
  return new ProblemError(413, "body-too-large", `The body is larger than the limit of ${maxBytes} bytes${size}; split it into several calls.`, { limit: maxBytes });
}

async function readText(request: Request, maxBytes: number): Promise<string> {
  const declared = Number(request.headers.get("content-length"));
  if (declared > maxBytes) throw tooLarge(maxBytes);
  if (!request.body) return "";
  const decoder = new TextDecoder();
  let text = "";
  let bytes = 0;
  for await (const chunk of request.body as unknown as AsyncIterable<Uint8Array>) {
    bytes += chunk.byteLength;
    if (bytes > maxBytes) throw tooLarge(maxBytes);
    text += decoder.decode(chunk, { stream: true });
  }
  return text + decoder.decode();
}

/** The validated input of a compute call, from the query string (GET) or a JSON body (POST). */
export async function parseInput<S extends ZodObject>(request: Request, schema: S, limits: InputLimits): Promise<output<S>> {
  const raw =
    request.method === "GET"
      ? queryToObject(new URL(request.url).searchParams, schema, limits.valuesPerQuery)
      : await readJsonBody(request, limits.jsonBodyBytes);
  return schema.parse(raw);
}
