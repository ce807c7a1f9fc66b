import { acceptInvitation } from "@/api-core/access/mutations";
import { readJson } from "@/api-core/http/admin-input";
import { withProblems } from "@/api-core/http/guard";
import { sessionResponse } from "@/api-core/http/session-guard";
import { AcceptInvitationBody } from "@/openapi/admin";

export const dynamic = "force-dynamic";

// No session: the invitation token is the credential.
export const POST = withProblems(async (request) => sessionResponse(request, await acceptInvitation(await readJson(request, AcceptInvitationBody))));
