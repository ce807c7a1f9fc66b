import Link from "next/link";

export default function Home() {
  return (
    <main className="mx-auto max-w-3xl px-6 py-16">
      <p className="text-sm font-medium uppercase tracking-widest text-shift-500">Comova</p>
      <h1 className="mt-2 text-4xl font-bold text-ink-900">Redshifts in, distances out — for the whole catalog.</h1>
      <p className="mt-6 text-lg leading-relaxed text-ink-700">
        Comova turns redshifts into comoving, transverse, angular-diameter and luminosity distances,
        distance moduli, lookback times and ages, angular scales and comoving volumes. Every answer names
        the exact cosmology that produced it — every parameter and a content hash — so a survey team can
        show, years later, how each number in a catalog was made.
      </p>
      <ul className="mt-10 grid gap-4 sm:grid-cols-2">
        <li>
          <Link href="/docs" className="block rounded-lg border border-ink-100 bg-white p-5 shadow-sm hover:border-shift-400">
            <span className="font-medium text-ink-900">API reference</span>
            <span className="mt-1 block text-sm text-ink-500">Every endpoint, parameter and error of /api/v1.</span>
          </Link>
        </li>
        <li>
          <Link href="/console" className="block rounded-lg border border-ink-100 bg-white p-5 shadow-sm hover:border-shift-400">
            <span className="font-medium text-ink-900">Team console</span>
            <span className="mt-1 block text-sm text-ink-500">Issue keys, invite members, watch usage, read the log.</span>
          </Link>
        </li>
      </ul>
    </main>
  );
}
