import { setRole } from "@/api-core/access/mutations";
import { readJson } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { MemberIdParams, SetRoleBody } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const PATCH = withSession<{ id: string }>(
  async ({ request, params, visibility, user }) => {
    const { role } = await readJson(request, SetRoleBody);
    return Response.json({ member: await setRole(MemberIdParams.parse(params).id, role, visibility, user) });
  },
  { permission: "members:set-role" },
);
