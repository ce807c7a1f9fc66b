import type { Metadata } from "next";
import { AcceptForm } from "./accept-form";

export const dynamic = "force-dynamic";
// The token is in this page's URL: never send it on to another site.
export const metadata: Metadata = { referrer: "no-referrer" };

export default async function AcceptInvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <main className="mx-auto max-w-sm px-6 py-16">
      <p className="text-sm font-medium uppercase tracking-widest text-shift-500">Comova console</p>
      <h1 className="mt-2 text-3xl font-bold text-ink-900">Accept your invitation</h1>
      {token ? (
        <>
          <p className="mt-2 text-ink-500">Choose a password to join your team. The link works once.</p>
          <AcceptForm token={token} />
        </>
      ) : (
        <p role="alert" className="mt-6 text-shift-700">This link has no invitation token; open the whole link from your invitation e-mail.</p>
      )}
    </main>
  );
}
