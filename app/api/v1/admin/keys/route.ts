import { issueKey } from "@/api-core/access/mutations";
import { listKeys } from "@/api-core/access/reads";
import { readJson, readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { IssueKeyBody, KeysQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(async ({ url, visibility }) => Response.json({ keys: await listKeys(visibility, readQuery(url, KeysQuery)) }), { permission: "keys:read" });

export const POST = withSession(
  async ({ request, visibility, user }) =>
    Response.json(await issueKey(await readJson(request, IssueKeyBody), visibility, user), { status: 201, headers: { "cache-control": "no-store" } }),
  { permission: "keys:manage" },
);
