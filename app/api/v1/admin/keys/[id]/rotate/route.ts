import { rotateKey } from "@/api-core/access/mutations";
import { readJson } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { KeyIdParams, RotateKeyBody } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(
  async ({ request, params, visibility, user }) => {
    const { overlapSeconds } = await readJson(request, RotateKeyBody);
    const rotated = await rotateKey(KeyIdParams.parse(params).id, overlapSeconds, visibility, user);
    return Response.json(rotated, { status: 201, headers: { "cache-control": "no-store" } });
  },
  { permission: "keys:manage" },
);
