import { signIn } from "@/api-core/access/sign-in";
import { readJson } from "@/api-core/http/admin-input";
import { clientAddress } from "@/api-core/http/client-address";
import { withProblems } from "@/api-core/http/guard";
import { sessionResponse, withSession } from "@/api-core/http/session-guard";
import { SignInBody } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const POST = withProblems(async (request) => {
  const { email, password } = await readJson(request, SignInBody);
  return sessionResponse(request, await signIn(email, password, clientAddress(request)));
});

export const GET = withSession(async ({ user }) => Response.json({ user }), { permission: null });

export const DELETE = withProblems(async (request) => sessionResponse(request, null));
