"use client";
import type { FormState } from "./actions";

export function Field({ label, name, type = "text", state, ...rest }: { label: string; name: string; type?: string; state: FormState } & React.InputHTMLAttributes<HTMLInputElement>) {
  const errors = state.errors[name];
  return (
    <label className="block">
      <span className="text-sm font-medium text-ink-700">{label}</span>
      <input
        name={name}
        type={type}
        aria-invalid={errors ? true : undefined}
        defaultValue={state.fields?.[name]}
        className="mt-1 block w-full rounded-md border border-ink-100 bg-white px-3 py-2 text-ink-900 shadow-sm focus:border-shift-400 focus:outline-none"
        {...rest}
      />
      {errors?.map((error) => (
        <span key={error} className="mt-1 block text-sm text-shift-700">{error}</span>
      ))}
    </label>
  );
}

export function FormMessage({ state }: { state: FormState }) {
  return state.message ? <p role="alert" className="rounded-md bg-shift-400/10 px-3 py-2 text-sm text-shift-700">{state.message}</p> : null;
}

export function Submit({ pending, children }: { pending: boolean; children: React.ReactNode }) {
  return (
    <button type="submit" disabled={pending} className="w-full rounded-md bg-ink-900 px-4 py-2 font-medium text-white hover:bg-ink-700 disabled:opacity-60">
      {children}
    </button>
  );
}
