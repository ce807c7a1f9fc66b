import { ping } from "@/db/client";
import { SERVICE_VERSION } from "./version";

export interface HealthReport {
  status: "ok" | "degraded";
  version: string;
  database: { reachable: boolean };
}

export async function health(): Promise<HealthReport> {
  const reachable = await ping();
  return { status: reachable ? "ok" : "degraded", version: SERVICE_VERSION, database: { reachable } };
}
