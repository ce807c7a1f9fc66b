// The browser's side of the admin API (/api/v1/admin/…). The comova_api_session cookie (SameSite=Strict,
// Path=/api/v1/admin) set at sign-in goes with every same-origin call; the server checks every role rule.
import type { FormState } from "./actions";

/** A refused admin call: its status, the problem's detail, and errors per field for 422s. */
export class AdminApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

export type Query = Record<string, string | number | undefined>;

/** The path with its query string; empty and missing values are left out. */
export function adminUrl(path: string, query: Query = {}): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) if (value !== undefined && value !== "") search.set(name, String(value));
  const text = search.toString();
  return `/api/v1/admin/${path}${text ? `?${text}` : ""}`;
}

async function call<T>(method: string, url: string, body?: unknown): Promise<T> {
  const response = await fetch(url, {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!response.ok) {
    const problem = (await response.json().catch(() => null)) as { detail?: string; errors?: { parameter: string; message: string }[] } | null;
    const fieldErrors: Record<string, string[]> = {};
    for (const { parameter, message } of problem?.errors ?? []) (fieldErrors[parameter.split(/[.[]/)[0]] ??= []).push(message);
    throw new AdminApiError(response.status, problem?.detail ?? `The server answered ${response.status}.`, fieldErrors);
  }
  return (await response.json()) as T;
}

export const adminGet = <T>(path: string, query?: Query) => call<T>("GET", adminUrl(path, query));
export const adminSend = <T>(method: "POST" | "PATCH", path: string, body: unknown) => call<T>(method, adminUrl(path), body);

/** A failed call as the state the console's form parts show. */
export function formStateOf(error: unknown): FormState {
  if (!error) return { errors: {}, message: null };
  if (error instanceof AdminApiError) return { errors: error.fieldErrors, message: error.message };
  return { errors: {}, message: "The server could not be reached; try again." };
}
