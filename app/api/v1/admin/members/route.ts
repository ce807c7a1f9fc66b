import { listMembers } from "@/api-core/access/reads";
import { readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { MembersQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(
  async ({ url, visibility }) => Response.json({ members: await listMembers(visibility, readQuery(url, MembersQuery)) }),
  { permission: "members:read" },
);
