import { SignInForm } from "./sign-in-form";

export const dynamic = "force-dynamic";

export default function SignInPage() {
  return (
    <main className="mx-auto max-w-sm px-6 py-16">
      <p className="text-sm font-medium uppercase tracking-widest text-shift-500">Comova console</p>
      <h1 className="mt-2 text-3xl font-bold text-ink-900">Sign in</h1>
      <p className="mt-2 text-ink-500">Your team&apos;s keys, members, usage and logs.</p>
      <SignInForm />
    </main>
  );
}
