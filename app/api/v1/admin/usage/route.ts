import { readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { monthOf } from "@/api-core/quota/monthly";
import { usageSummary } from "@/api-core/quota/usage-summary";
import { UsageQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(
  async ({ url, visibility }) => {
    const { month, ...filter } = readQuery(url, UsageQuery);
    return Response.json(await usageSummary(visibility, filter, month ?? monthOf(Date.now())));
  },
  { permission: "usage:read" },
);
