/**
 * The caller's address. Route handlers do not see the socket, and `next start` fills
 * X-Forwarded-For from it only when the header is absent, so this is only as trustworthy as the
 * reverse proxy in front (which must overwrite the header). Used for the log and the sign-in throttle.
 */
export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || request.headers.get("x-real-ip") || "unknown";
}
