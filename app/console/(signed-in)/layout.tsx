import { ConsoleShell } from "../console-shell";
import { requireUser } from "../session";

export const dynamic = "force-dynamic";

export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  return <ConsoleShell user={await requireUser()}>{children}</ConsoleShell>;
}
