import { distances } from "@/api-core/compute/endpoints";
import { answerJson } from "@/api-core/compute/respond";
import { parseInput } from "@/api-core/compute/input";
import { withKey } from "@/api-core/http/guard";
import { DistancesInput } from "@/openapi/compute";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

const handle = withKey(async (call) => answerJson(async () => distances(await parseInput(call.request, DistancesInput, LIMITS), call)), { scope: "compute" });

export const GET = handle;
export const POST = handle;
