// Monthly evaluation units: one atomic conditional statement, exact under concurrency (OWASP API4).
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { issueKey } from "@/api-core/access/mutations";
import { createTeam } from "@/api-core/access/mutations";
import { chargeUnits, monthOf, monthResetsAt, unitsUsed } from "@/api-core/quota/monthly";
import { useFreshDatabase } from "../access/fresh-database";

const run = promisify(execFile);
const database = useFreshDatabase();

async function newKey(monthlyUnits: number) {
  const team = await createTeam({ slug: `t-${Math.random().toString(36).slice(2, 10)}`, name: "Quota team" }, null);
  return (await issueKey({ name: "quota", teamId: team.id, monthlyUnits }, {}, null)).key;
}

describe("chargeUnits", () => {
  it("spends units while they fit and refuses the call that would overspend, changing nothing", async () => {
    const key = await newKey(10);
    expect(await chargeUnits(key.id, 10, 4)).toEqual({ charged: true, used: 4 });
    expect(await chargeUnits(key.id, 10, 7)).toEqual({ charged: false });
    expect(await chargeUnits(key.id, 10, 6)).toEqual({ charged: true, used: 10 });
    expect(await chargeUnits(key.id, 10, 1)).toEqual({ charged: false });
    expect(await unitsUsed(key.id)).toBe(10);
  });

  it("refuses a first charge larger than the whole quota without creating a row", async () => {
    const key = await newKey(5);
    expect(await chargeUnits(key.id, 5, 6)).toEqual({ charged: false });
    expect(await unitsUsed(key.id)).toBe(0);
  });

  it("counts per UTC calendar month and resets at the start of the next", async () => {
    const key = await newKey(3);
    const january = Date.UTC(2031, 0, 31, 23, 59);
    expect(await chargeUnits(key.id, 3, 3, january)).toEqual({ charged: true, used: 3 });
    expect(await chargeUnits(key.id, 3, 1, Date.UTC(2031, 1, 1))).toEqual({ charged: true, used: 1 });
    expect(monthOf(january)).toBe("2031-01");
    expect(monthResetsAt(january)).toBe(Date.UTC(2031, 1, 1));
  });

  it("grants exactly 100 of 200 concurrent one-unit charges from two processes", async () => {
    const key = await newKey(100);
    const worker = () =>
      run(process.execPath, ["--import", "tsx", "tests/quota/charge-worker.ts", key.id, "100", "100"], { env: { ...process.env, DATABASE_URL: database.url() } }).then(
        ({ stdout }) => JSON.parse(stdout.trim().split("\n").pop()!).granted as number,
      );
    const granted = await Promise.all([worker(), worker()]);
    expect(granted[0] + granted[1]).toBe(100);
    expect(await unitsUsed(key.id)).toBe(100);
  }, 60_000);
});
