import { ProblemError } from "@/api-core/http/problem";
import { limiter } from "@/api-core/quota/limiter";
import { hashPassword, verifyPassword } from "./password";
import { findSessionUser, findUserByEmail } from "./reads";
import type { SessionUser } from "./types";

/**
 * Failed sign-ins are throttled (OWASP API2, broken authentication): per e-mail address, so one
 * account cannot be guessed at from many places, and per client address, so one place cannot try
 * many accounts. A success clears the e-mail's count.
 */
export const FAILURES_PER_EMAIL = 5;
export const FAILURES_PER_ADDRESS = 30;
const WINDOW_SECONDS = 15 * 60;

const byEmail = () => limiter("sign-in-email", FAILURES_PER_EMAIL, WINDOW_SECONDS);
const byAddress = () => limiter("sign-in-address", FAILURES_PER_ADDRESS, WINDOW_SECONDS);

let dummyHash: Promise<string> | undefined;

function throttled(msBeforeNext: number): ProblemError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  return new ProblemError(429, "sign-in-throttled", `Too many failed sign-ins; wait ${seconds} s before trying again, or ask an administrator to reset your password.`, {}, { "Retry-After": String(seconds) });
}

export async function signIn(email: string, password: string, clientAddress: string): Promise<SessionUser> {
  const emailKey = email.toLowerCase();
  const [emailState, addressState] = await Promise.all([byEmail().get(emailKey), byAddress().get(clientAddress)]);
  for (const [state, points] of [[emailState, FAILURES_PER_EMAIL], [addressState, FAILURES_PER_ADDRESS]] as const) {
    if (state && state.consumedPoints >= points) throw throttled(state.msBeforeNext);
  }
  const row = await findUserByEmail(emailKey);
  // An unknown e-mail costs one scrypt too, so timing does not tell which addresses have accounts.
  dummyHash ??= hashPassword("comova-no-such-user");
  const valid = await verifyPassword(password, row?.passwordHash ?? (await dummyHash));
  const user = valid && row ? await findSessionUser(row.id) : null;
  if (!user) {
    await Promise.all([byEmail().penalty(emailKey), byAddress().penalty(clientAddress)]);
    throw new ProblemError(401, "sign-in-failed", "The e-mail address or the password is wrong (or the account is disabled). Check both and try again.");
  }
  await byEmail().delete(emailKey);
  return user;
}
