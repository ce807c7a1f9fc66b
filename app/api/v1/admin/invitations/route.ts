import { inviteMember } from "@/api-core/access/mutations";
import { listInvitations } from "@/api-core/access/reads";
import { publicOrigin, readJson, readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { InviteBody, MembersQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(
  async ({ url, visibility }) => Response.json({ invitations: await listInvitations(visibility, readQuery(url, MembersQuery)) }),
  { permission: "members:invite" },
);

export const POST = withSession(
  async ({ request, visibility, user }) =>
    Response.json(await inviteMember(await readJson(request, InviteBody), visibility, user, publicOrigin(request)), { status: 201 }),
  { permission: "members:invite" },
);
