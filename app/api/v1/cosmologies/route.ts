import { readJsonBody } from "@/api-core/compute/input";
import { withKey } from "@/api-core/http/guard";
import { createProfile, listCosmologies } from "@/api-core/profiles";
import { ProfileInput } from "@/openapi/cosmologies";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

export const GET = withKey(async ({ key }) => Response.json({ cosmologies: await listCosmologies(key.teamId) }), { scope: "compute" });

export const POST = withKey(
  async ({ request, key }) => {
    const input = ProfileInput.parse(await readJsonBody(request, LIMITS.jsonBodyBytes));
    return Response.json(await createProfile(key.teamId, input, { id: key.id, email: key.prefix }), { status: 201 });
  },
  { scope: "profiles:write" },
);
