// Times are shown in UTC everywhere in the console: months and quotas are UTC months.

export function utcTime(time: number | null): string {
  return time ? new Date(time).toISOString().slice(0, 16).replace("T", " ") + " UTC" : "—";
}

export const count = (value: number) => value.toLocaleString("en");

/** The current UTC month, YYYY-MM. */
export const thisMonth = () => new Date().toISOString().slice(0, 7);
