import { completeRequest, logRequest } from "@/api-core/audit/request-log";
import type { KeyScope } from "@/api-core/access/types";
import { consumeBurst, type BurstState } from "@/api-core/quota/burst";
import { chargeUnits, monthResetsAt, monthStartsAt, unitsUsed } from "@/api-core/quota/monthly";
import { clientAddress } from "./client-address";
import { identifyKey, requireActive, requireScope, type AuthenticatedKey } from "./key-auth";
import { ProblemError, problemResponse, toProblem } from "./problem";
import { rateLimitHeaders, type MonthlyState } from "./rate-limit-headers";

export type Scope = KeyScope;

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
  /** The calling key (authenticated, with the route's scope, within its burst limit). */
  key: KeyIdentity;
  /** Spends evaluation units (one per redshift evaluated) before the work is done; 429 when they do not fit. */
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

/** What the guard learns about one keyed call, for its headers and its request-log entry. */
interface CallRecord {
  key: AuthenticatedKey | null;
  burst: BurstState | null;
  unitsUsed: number | null;
  evaluations: number;
  cosmologyHash: string | null;
  cosmologyRef: string | null;
}

const isoTime = (time: number) => new Date(time).toISOString();

function burstExceeded(key: AuthenticatedKey, burst: BurstState): ProblemError {
  return new ProblemError(
    429,
    "burst-limit",
    `Key ${key.prefix}… made more than ${burst.limit} calls within ${burst.windowSeconds} s (its burst limit); retry in ${burst.resetSeconds} s, or send more redshifts per call.`,
    { limit: "burst" },
    { "Retry-After": String(burst.resetSeconds) },
  );
}

/** Inside the handler: the monthly evaluation units, one atomic conditional charge. */
async function charge(call: CallRecord, key: AuthenticatedKey, units: number): Promise<void> {
  if (!Number.isInteger(units) || units < 0) throw new Error(`charge(${units}): units must be a whole number ≥ 0`);
  if (units === 0) return;
  const now = Date.now();
  const result = await chargeUnits(key.id, key.monthlyUnits, units, now);
  if (result.charged) {
    call.unitsUsed = result.used;
    call.evaluations += units;
    return;
  }
  call.unitsUsed = await unitsUsed(key.id, now);
  const resetsAt = monthResetsAt(now);
  const left = Math.max(0, key.monthlyUnits - call.unitsUsed);
  throw new ProblemError(
    429,
    "monthly-quota",
    `This call needs ${units} evaluation units but key ${key.prefix}… has ${left} of its ${key.monthlyUnits} monthly units left (monthly quota); it resets at ${isoTime(resetsAt)}. Send fewer redshifts, or ask a team manager to raise the key's monthly units.`,
    { limit: "monthly", resetsAt: isoTime(resetsAt) },
    { "Retry-After": String(Math.ceil((resetsAt - now) / 1000)) },
  );
}

async function monthlyState(call: CallRecord, key: AuthenticatedKey): Promise<MonthlyState> {
  const now = Date.now();
  const used = call.unitsUsed ?? (await unitsUsed(key.id, now));
  const endsAt = monthResetsAt(now);
  return { limit: key.monthlyUnits, used, windowSeconds: (endsAt - monthStartsAt(now)) / 1000, resetSeconds: Math.ceil((endsAt - now) / 1000) };
}

function withHeaders(response: Response, headers: Record<string, string>): Response {
  try {
    for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
    return response;
  } catch {
    // Immutable headers (a forwarded fetch response): copy into a new response.
    const copy = new Response(response.body, response);
    for (const [name, value] of Object.entries(headers)) copy.headers.set(name, value);
    return copy;
  }
}

/**
 * The guard of every keyed API route: identify the key → active → scope → burst limit → handler (which charges
 * the monthly units) → rate-limit headers → request log, awaited before the answer leaves.
 * Usage: `export const GET = withKey(async ({ url, charge }) => …, { scope: "compute" })`.
 */
export function withKey<Params = Record<string, never>>(
  handler: (context: CallContext<Params>) => Promise<Response>,
  options: { scope: Scope },
): RouteHandler<Params> {
  return withProblems<Params>(async (request, params) => {
    const started = performance.now();
    const url = new URL(request.url);
    const call: CallRecord = { key: null, burst: null, unitsUsed: null, evaluations: 0, cosmologyHash: null, cosmologyRef: null };
    let response: Response;
    try {
      const key = (call.key = await identifyKey(request));
      requireActive(key);
      requireScope(key, options.scope);
      call.burst = await consumeBurst(key.id, key.perMinute);
      if (!call.burst.allowed) throw burstExceeded(key, call.burst);
      response = await handler({
        request,
        url,
        params,
        key: { id: key.id, teamId: key.teamId, prefix: key.prefix, scopes: key.scopes },
        charge: (units) => charge(call, key, units),
        note(entry) {
          if (entry.cosmologyHash !== undefined) call.cosmologyHash = entry.cosmologyHash;
          if (entry.cosmologyRef !== undefined) call.cosmologyRef = entry.cosmologyRef;
        },
      });
    } catch (error) {
      response = problemResponse(toProblem(error), url.pathname);
    }
    const key = call.key;
    if (!key) return response;
    if (call.burst) response = withHeaders(response, rateLimitHeaders(call.burst, await monthlyState(call, key)));
    const logId = await logRequest({
      at: Date.now(),
      keyId: key.id,
      keyPrefix: key.prefix,
      teamId: key.teamId,
      method: request.method,
      route: url.pathname,
      status: response.status,
      durationMs: Math.round(performance.now() - started),
      evaluations: call.evaluations,
      cosmologyHash: call.cosmologyHash,
      cosmologyRef: call.cosmologyRef,
      clientAddress: clientAddress(request),
    });
    const loggedEvaluations = call.evaluations;
    if (!response.body) return response;
    const body = whenStreamEnds(response.body, async (error) => {
      if (!error && call.evaluations === loggedEvaluations) return;
      await completeRequest(logId, {
        evaluations: call.evaluations,
        status: error ? toProblem(error).status : response.status,
        durationMs: Math.round(performance.now() - started),
      });
    });
    return new Response(body, response);
  });
}

/** Passes a body through and calls `ended` once it has been read to the end, failed, or been cancelled. */
function whenStreamEnds(body: ReadableStream<Uint8Array>, ended: (error?: unknown) => Promise<void>): ReadableStream<Uint8Array> {
  const reader = body.getReader();
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      let chunk: ReadableStreamReadResult<Uint8Array>;
      try {
        chunk = await reader.read();
      } catch (error) {
        await ended(error);
        controller.error(error);
        return;
      }
      if (chunk.done) {
        await ended();
        controller.close();
      } else controller.enqueue(chunk.value);
    },
    async cancel(reason) {
      await ended(reason ?? new ProblemError(499, "client-closed", "The client closed the connection before the answer ended."));
      await reader.cancel(reason);
    },
  });
}
