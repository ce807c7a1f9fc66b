import { authorize } from "@/api-core/access/authorize";
import { PERMISSIONS } from "@/api-core/access/permissions";
import { listKeys } from "@/api-core/access/reads";
import { requireUser } from "../session";
import { KeysView } from "./keys/keys-view";

export const dynamic = "force-dynamic";

export default async function KeysPage({ searchParams }: { searchParams: Promise<{ refused?: string }> }) {
  const user = await requireUser();
  // Only a known permission is named, so that a crafted link cannot put its own words on the page.
  const { refused: asked } = await searchParams;
  const refused = Object.keys(PERMISSIONS).find((permission) => permission === asked);
  // The first paint comes with the list; the client keeps it fresh through the admin API.
  const keys = await listKeys(authorize(user, "keys:read"), {});
  return (
    <>
      {refused && (
        <p role="alert" className="mb-6 rounded-md bg-shift-400/10 px-3 py-2 text-sm text-shift-700">
          {`Your role (${user.role}) cannot open that page: it needs the permission ${refused}. Ask a team manager or an administrator if you need it.`}
        </p>
      )}
      <KeysView initialKeys={keys} />
    </>
  );
}
