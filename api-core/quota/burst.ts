import { RateLimiterRes } from "rate-limiter-flexible";
import { limiter } from "./limiter";

const WINDOW_SECONDS = 60;

export interface BurstState {
  limit: number;
  windowSeconds: number;
  remaining: number;
  resetSeconds: number;
  allowed: boolean;
}

/** Takes one call from a key's per-minute allowance. */
export async function consumeBurst(keyId: string, perMinute: number): Promise<BurstState> {
  const base = { limit: perMinute, windowSeconds: WINDOW_SECONDS };
  try {
    const result = await limiter("burst", perMinute, WINDOW_SECONDS).consume(keyId);
    return { ...base, allowed: true, remaining: result.remainingPoints, resetSeconds: Math.ceil(result.msBeforeNext / 1000) };
  } catch (rejection) {
    if (!(rejection instanceof RateLimiterRes)) throw rejection;
    return { ...base, allowed: false, remaining: 0, resetSeconds: Math.max(1, Math.ceil(rejection.msBeforeNext / 1000)) };
  }
}
