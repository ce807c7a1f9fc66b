import { teamWithin } from "@/api-core/access/permissions";
import { listAudit } from "@/api-core/audit/audit-trail";
import { readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { AuditQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(
  async ({ url, visibility }) => {
    const { before, limit, ...query } = readQuery(url, AuditQuery);
    const entries = await listAudit({ ...query, teamId: teamWithin(visibility, query.teamId) }, { before, limit });
    return Response.json({ entries, nextBefore: entries.length === limit ? entries[entries.length - 1].id : null });
  },
  { permission: "audit-trail:read" },
);
