import { requirePermission } from "../../session";
import { UsageView } from "./usage-view";

export const dynamic = "force-dynamic";

export default async function UsagePage() {
  await requirePermission("usage:read");
  return <UsageView />;
}
