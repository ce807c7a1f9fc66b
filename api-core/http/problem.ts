import { ZodError } from "zod";

/** RFC 9457 problem details. `type` is a URN of ours; `detail` tells a person what to change. */
export interface ProblemBody {
  type: string;
  title: string;
  status: number;
  detail: string;
  instance?: string;
  [extension: string]: unknown;
}

export const PROBLEM_CONTENT_TYPE = "application/problem+json";

const TITLES: Record<number, string> = {
  400: "Bad request",
  401: "Not authenticated",
  403: "Forbidden",
  404: "Not found",
  405: "Method not allowed",
  409: "Conflict",
  413: "Content too large",
  415: "Unsupported media type",
  422: "Invalid parameters",
  429: "Too many requests",
  500: "Internal error",
  503: "Service unavailable",
};

/** The one error type of the service; every status a client sees comes from here. */
export class ProblemError extends Error {
  constructor(
    readonly status: number,
    readonly slug: string,
    readonly detail: string,
    readonly extensions: Record<string, unknown> = {},
    readonly headers: Record<string, string> = {},
  ) {
    super(detail);
    this.name = "ProblemError";
  }

  body(instance?: string): ProblemBody {
    return {
      type: `urn:comova:problem:${this.slug}`,
      title: TITLES[this.status] ?? "Error",
      status: this.status,
      detail: this.detail,
      ...(instance ? { instance } : {}),
      ...this.extensions,
    };
  }
}

/** A zod failure as a 422 naming every offending field, e.g. "z[3]: expected a number". */
export function validationProblem(error: ZodError): ProblemError {
  const errors = error.issues.map((issue) => ({
    parameter: issue.path.map((p, i) => (typeof p === "number" ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`)).join(""),
    message: issue.message,
  }));
  const detail = errors.map((e) => (e.parameter ? `${e.parameter}: ${e.message}` : e.message)).join("; ");
  return new ProblemError(422, "invalid-parameters", detail, { errors });
}

/**
 * Turns anything thrown into a ProblemError. Errors that carry a `parameter` (the cosmology engine's)
 * are the caller's fault; anything else is ours, logged here and answered with a generic 500 so that
 * internals never reach a client.
 */
export function toProblem(error: unknown): ProblemError {
  if (error instanceof ProblemError) return error;
  if (error instanceof ZodError) return validationProblem(error);
  const parameter = (error as { parameter?: unknown })?.parameter;
  if (error instanceof Error && typeof parameter === "string") {
    return new ProblemError(422, "invalid-cosmology", error.message, { errors: [{ parameter, message: error.message }] });
  }
  console.error("Unexpected error", error);
  return new ProblemError(500, "internal", "The server failed to answer this request; it has been logged. Try again, and report it if it persists.");
}

export function problemResponse(problem: ProblemError, instance?: string): Response {
  return new Response(JSON.stringify(problem.body(instance)), {
    status: problem.status,
    headers: { "content-type": PROBLEM_CONTENT_TYPE, ...problem.headers },
  });
}
