import type { ZodType, output } from "zod";
import { ProblemError } from "./problem";

const MAX_BODY_BYTES = 64 * 1024;

/** The JSON body of an admin request, validated by its schema (zod errors become 422). */
export async function readJson<Schema extends ZodType>(request: Request, schema: Schema): Promise<output<Schema>> {
  const text = await request.text();
  if (text.length > MAX_BODY_BYTES) throw new ProblemError(413, "body-too-large", `Admin request bodies are at most ${MAX_BODY_BYTES} bytes.`);
  let value: unknown;
  try {
    value = text === "" ? {} : JSON.parse(text);
  } catch {
    throw new ProblemError(400, "malformed-json", "The body is not valid JSON; send a JSON object with Content-Type: application/json.");
  }
  return schema.parse(value);
}

/** The query string of an admin request, validated by its schema. */
export function readQuery<Schema extends ZodType>(url: URL, schema: Schema): output<Schema> {
  return schema.parse(Object.fromEntries(url.searchParams));
}

/**
 * Origin for links in e-mails: PUBLIC_URL when set (recommended in production), else the host the
 * inviting manager's browser used (Next's request.url names the server's own listening address).
 */
export function publicOrigin(request: Request): string {
  if (process.env.PUBLIC_URL) return process.env.PUBLIC_URL.replace(/\/$/, "");
  const url = new URL(request.url);
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host") ?? url.host;
  const protocol = request.headers.get("x-forwarded-proto") ?? url.protocol.replace(":", "");
  return `${protocol}://${host}`;
}

/** Whether cookies should carry Secure: the original request came over https. */
export function isHttps(request: Request): boolean {
  return (request.headers.get("x-forwarded-proto") ?? new URL(request.url).protocol.replace(":", "")) === "https";
}
