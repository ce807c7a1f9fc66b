import { withKey } from "@/api-core/http/guard";
import { cosmologyVersions } from "@/api-core/profiles";

export const dynamic = "force-dynamic";

export const GET = withKey<{ slug: string }>(
  async ({ params, key }) => {
    const versions = await cosmologyVersions(params.slug, key.teamId);
    return Response.json({ slug: params.slug, latest: versions[versions.length - 1].ref, versions });
  },
  { scope: "compute" },
);
