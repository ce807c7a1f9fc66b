import { createTeam } from "@/api-core/access/mutations";
import { listTeams } from "@/api-core/access/reads";
import { readJson } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { CreateTeamBody } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(async ({ visibility }) => Response.json({ teams: await listTeams(visibility) }), { permission: "teams:read" });

export const POST = withSession(
  async ({ request, user }) => Response.json({ team: await createTeam(await readJson(request, CreateTeamBody), user) }, { status: 201 }),
  { permission: "teams:create" },
);
