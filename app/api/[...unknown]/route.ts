import { ProblemError, problemResponse } from "@/api-core/http/problem";

// Any /api path without a route of its own answers 404 problem+json rather than an HTML page.
function notFound(request: Request): Response {
  const path = new URL(request.url).pathname;
  return problemResponse(
    new ProblemError(404, "not-found", `There is no API endpoint at ${path}. The endpoints are listed in /api/v1/openapi.json and at /docs.`),
    path,
  );
}

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
