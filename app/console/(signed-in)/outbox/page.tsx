import { requirePermission } from "../../session";
import { OutboxView } from "./outbox-view";

export const dynamic = "force-dynamic";

export default async function OutboxPage() {
  await requirePermission("outbox:read");
  return <OutboxView />;
}
