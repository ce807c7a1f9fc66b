import { health } from "@/api-core/http/health";
import { withProblems } from "@/api-core/http/guard";

export const dynamic = "force-dynamic";

export const GET = withProblems(async () => {
  const report = await health();
  return Response.json(report, { status: report.status === "ok" ? 200 : 503 });
});
