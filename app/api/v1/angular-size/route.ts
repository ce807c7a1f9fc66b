import { angularSize } from "@/api-core/compute/endpoints";
import { answerJson } from "@/api-core/compute/respond";
import { parseInput } from "@/api-core/compute/input";
import { withKey } from "@/api-core/http/guard";
import { AngularSizeInput } from "@/openapi/compute";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

const handle = withKey(async (call) => answerJson(async () => angularSize(await parseInput(call.request, AngularSizeInput, LIMITS), call)), { scope: "compute" });

export const GET = handle;
export const POST = handle;
