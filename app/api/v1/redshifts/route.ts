import { redshifts } from "@/api-core/compute/endpoints";
import { answerJson } from "@/api-core/compute/respond";
import { parseInput } from "@/api-core/compute/input";
import { withKey } from "@/api-core/http/guard";
import { RedshiftsInput } from "@/openapi/compute";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

const handle = withKey(async (call) => answerJson(async () => redshifts(await parseInput(call.request, RedshiftsInput, LIMITS), call)), { scope: "compute" });

export const GET = handle;
export const POST = handle;
