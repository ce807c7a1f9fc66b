import { Redis } from "ioredis";
import { RateLimiterMemory, RateLimiterRedis, type RateLimiterAbstract } from "rate-limiter-flexible";

/**
 * Counters of rate-limiter-flexible: in this process by default; in Redis when REDIS_URL is set, so
 * that every instance shares them. If Redis is unreachable, an in-process limiter stands in
 * (rate-limiter-flexible's insurance limiter) rather than failing the call.
 */
const state = globalThis as unknown as { comovaRedis?: Redis; comovaLimiters?: Map<string, RateLimiterAbstract> };

function redis(url: string): Redis {
  // Commands wait for the first connection; when Redis is down they fail after one retry and the
  // insurance limiter answers.
  state.comovaRedis ??= new Redis(url, { maxRetriesPerRequest: 1 });
  return state.comovaRedis;
}

/** One limiter per (name, points, window); limiters are cached, their counters keyed by caller. */
export function limiter(name: string, points: number, durationSeconds: number): RateLimiterAbstract {
  state.comovaLimiters ??= new Map();
  const id = `${name}:${points}:${durationSeconds}`;
  let found = state.comovaLimiters.get(id);
  if (!found) {
    const options = { keyPrefix: `comova:${id}`, points, duration: durationSeconds };
    const memory = new RateLimiterMemory(options);
    const url = process.env.REDIS_URL;
    found = url ? new RateLimiterRedis({ ...options, storeClient: redis(url), insuranceLimiter: memory }) : memory;
    state.comovaLimiters.set(id, found);
  }
  return found;
}
