"use client";
import { useState } from "react";

/** A new key's secret: shown this once, never stored by Comova in readable form. */
export function SecretOnce({ title, secret, onDone }: { title: string; secret: string; onDone: () => void }) {
  const [copied, setCopied] = useState(false);
  return (
    <section aria-label="New secret" className="mt-4 rounded-lg border border-shift-400 bg-white p-4 shadow-sm">
      <h3 className="font-medium text-ink-900">{title}</h3>
      <p className="mt-1 text-sm text-shift-700">Copy it now: this is the only time it is shown. Comova keeps only a hash, so a lost secret cannot be recovered — rotate or issue a new key instead.</p>
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <code data-testid="secret" className="min-w-0 break-all rounded-md bg-ink-50 px-3 py-2 font-mono text-sm text-ink-900">{secret}</code>
        <button
          type="button"
          onClick={async () => {
            await navigator.clipboard.writeText(secret);
            setCopied(true);
          }}
          className="rounded-md bg-ink-900 px-3 py-2 text-sm font-medium text-white hover:bg-ink-700"
        >
          {copied ? "Copied" : "Copy"}
        </button>
        <button type="button" onClick={onDone} className="rounded-md px-3 py-2 text-sm text-ink-500 hover:text-ink-900">I have stored it</button>
      </div>
    </section>
  );
}
