import { requirePermission } from "../../session";
import { LogView } from "./log-view";

export const dynamic = "force-dynamic";

export default async function RequestLogPage() {
  await requirePermission("request-log:read");
  return <LogView />;
}
