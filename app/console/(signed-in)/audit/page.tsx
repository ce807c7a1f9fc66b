import { requirePermission } from "../../session";
import { AuditView } from "./audit-view";

export const dynamic = "force-dynamic";

export default async function AuditTrailPage() {
  await requirePermission("audit-trail:read");
  return <AuditView />;
}
