import { lookbackTime } from "@/api-core/compute/endpoints";
import { answerJson } from "@/api-core/compute/respond";
import { parseInput } from "@/api-core/compute/input";
import { withKey } from "@/api-core/http/guard";
import { LookbackTimeInput } from "@/openapi/compute";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

const handle = withKey(async (call) => answerJson(async () => lookbackTime(await parseInput(call.request, LookbackTimeInput, LIMITS), call)), { scope: "compute" });

export const GET = handle;
export const POST = handle;
