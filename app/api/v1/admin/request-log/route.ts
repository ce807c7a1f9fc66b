import { teamWithin } from "@/api-core/access/permissions";
import { csvStream } from "@/api-core/audit/csv";
import { allRequests, listRequests, type RequestLogEntry } from "@/api-core/audit/request-log";
import { readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { RequestLogQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

const CSV_COLUMNS: (keyof RequestLogEntry)[] = ["id", "at", "keyId", "keyPrefix", "teamId", "method", "route", "status", "durationMs", "evaluations", "cosmologyHash", "cosmologyRef", "clientAddress"];

export const GET = withSession(
  async ({ url, visibility }) => {
    const { before, limit, format, ...query } = readQuery(url, RequestLogQuery);
    const filter = { ...query, teamId: teamWithin(visibility, query.teamId) };
    if (format === "csv") {
      return new Response(csvStream(CSV_COLUMNS, allRequests(filter)), {
        headers: { "content-type": "text/csv; charset=utf-8; header=present", "content-disposition": 'attachment; filename="comova-request-log.csv"' },
      });
    }
    const entries = await listRequests(filter, { before, limit });
    return Response.json({ entries, nextBefore: entries.length === limit ? entries[entries.length - 1].id : null });
  },
  { permission: "request-log:read" },
);
