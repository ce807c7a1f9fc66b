import type { BurstState } from "@/api-core/quota/burst";

export interface MonthlyState {
  limit: number;
  used: number;
  /** Length of this month and seconds until it ends. */
  windowSeconds: number;
  resetSeconds: number;
}

/**
 * `RateLimit-Policy` and `RateLimit` fields of draft-ietf-httpapi-ratelimit-headers-11: Structured
 * Field lists with one item per policy — "burst" (calls per minute) and "monthly" (evaluation units).
 */
export function rateLimitHeaders(burst: BurstState, monthly: MonthlyState | null): Record<string, string> {
  const policies = [`"burst";q=${burst.limit};w=${burst.windowSeconds}`];
  const states = [`"burst";r=${burst.remaining};t=${burst.resetSeconds}`];
  if (monthly) {
    policies.push(`"monthly";q=${monthly.limit};qu="evaluations";w=${monthly.windowSeconds}`);
    states.push(`"monthly";r=${Math.max(0, monthly.limit - monthly.used)};t=${monthly.resetSeconds}`);
  }
  return { "RateLimit-Policy": policies.join(", "), RateLimit: states.join(", ") };
}
