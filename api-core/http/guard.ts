import { ProblemError, problemResponse, toProblem } from "./problem";

export type Scope = "compute" | "profiles:write";

/** Who is calling, as far as a route needs to know. Never holds the secret. */
export interface KeyIdentity {
  id: string;
  teamId: string;
  prefix: string;
  scopes: string[];
}

export interface CallContext<Params> {
  request: Request;
  url: URL;
  params: Params;
  /** The calling key; null while the compute routes are open (before access control is wired in). */
  key: KeyIdentity | null;
  /** Spends evaluation units (one per redshift evaluated) before the work is done. */
  charge(units: number): Promise<void>;
  /** Records which cosmology answered, for the request log. */
  note(entry: { cosmologyHash?: string; cosmologyRef?: string | null }): void;
}

type RouteHandler<Params> = (request: Request, context: { params: Promise<Params> }) => Promise<Response>;

/** Wraps a handler so that anything it throws leaves as RFC 9457 problem+json. */
export function withProblems<Params = Record<string, never>>(
  handler: (request: Request, params: Params) => Promise<Response>,
): RouteHandler<Params> {
  return async (request, context) => {
    try {
      return await handler(request, (await context?.params) ?? ({} as Params));
    } catch (error) {
      return problemResponse(toProblem(error), new URL(request.url).pathname);
    }
  };
}

/**
 * The guard of every keyed API route: authenticate → scope → quota → log, then the handler.
 * Usage: `export const GET = withKey(async ({ url, charge }) => …, { scope: "compute" })`.
 */
export function withKey<Params = Record<string, never>>(
  handler: (context: CallContext<Params>) => Promise<Response>,
  options: { scope: Scope },
): RouteHandler<Params> {
  void options.scope;
  return withProblems<Params>(async (request, params) => {
    let units = 0;
    return handler({
      request,
      url: new URL(request.url),
      params,
      key: null,
      async charge(n) {
        if (!Number.isInteger(n) || n < 0) throw new ProblemError(500, "internal", "Invalid charge.");
        units += n;
      },
      note() {},
    });
  });
}
