import { authorize } from "@/api-core/access/authorize";
import { listKeys } from "@/api-core/access/reads";
import { signOutAction } from "./actions";
import { requireUser } from "./session";

export const dynamic = "force-dynamic";

const when = (time: number | null) => (time ? new Date(time).toISOString().slice(0, 16).replace("T", " ") + " UTC" : "—");

export default async function ConsoleHome() {
  const user = await requireUser();
  const keys = await listKeys(authorize(user, "keys:read"), {});
  return (
    <main className="mx-auto max-w-4xl px-6 py-12">
      <header className="flex items-baseline justify-between">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-shift-500">Comova console</p>
          <h1 className="mt-2 text-3xl font-bold text-ink-900">{user.name}</h1>
          <p className="text-ink-500">
            {user.email} · {user.role}
          </p>
        </div>
        <form action={signOutAction}>
          <button className="rounded-md border border-ink-100 px-3 py-1.5 text-sm text-ink-700 hover:border-shift-400">Sign out</button>
        </form>
      </header>
      <section className="mt-10">
        <h2 className="text-xl font-medium text-ink-900">API keys</h2>
        {keys.length === 0 ? (
          <p className="mt-3 text-ink-500">No keys yet.</p>
        ) : (
          <table className="mt-3 w-full text-left text-sm">
            <thead className="text-ink-500">
              <tr>
                <th className="py-2">Name</th>
                <th>Key</th>
                <th>Scopes</th>
                <th>Limits</th>
                <th>Status</th>
                <th>Last used</th>
              </tr>
            </thead>
            <tbody>
              {keys.map((key) => (
                <tr key={key.id} className="border-t border-ink-100">
                  <td className="py-2 text-ink-900">{key.name}</td>
                  <td className="font-mono text-ink-700">{key.prefix}…</td>
                  <td>{key.scopes.join(", ")}</td>
                  <td>
                    {key.perMinute}/min · {key.monthlyUnits.toLocaleString("en")} units/month
                  </td>
                  <td className={key.status === "active" ? "text-ink-900" : "text-shift-600"}>{key.status}</td>
                  <td>{when(key.lastUsedAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </main>
  );
}
