import { withProblems } from "@/api-core/http/guard";
import { openApiDocument } from "@/openapi/document";

export const dynamic = "force-dynamic";

export const GET = withProblems(async () => Response.json(openApiDocument()));
