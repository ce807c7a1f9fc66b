import { revokeKey } from "@/api-core/access/mutations";
import { withSession } from "@/api-core/http/session-guard";
import { KeyIdParams } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(
  async ({ params, visibility, user }) => Response.json({ key: await revokeKey(KeyIdParams.parse(params).id, visibility, user) }),
  { permission: "keys:manage" },
);
