import { requirePermission } from "../../session";
import { MembersView } from "./members-view";

export const dynamic = "force-dynamic";

export default async function MembersPage() {
  await requirePermission("members:read");
  return <MembersView />;
}
