// The per-minute burst limit (rate-limiter-flexible): in-process by default, shared through Redis
// when REDIS_URL is set, so N instances enforce one limit (OWASP API4).
import { execFile, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { createServer } from "node:net";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { consumeBurst } from "@/api-core/quota/burst";

const run = promisify(execFile);

describe("burst limit, in process", () => {
  it("allows perMinute calls, counts down, then refuses with the seconds to wait", async () => {
    const key = `key_${Math.random()}`;
    const states = [];
    for (let i = 0; i < 4; i++) states.push(await consumeBurst(key, 3));
    expect(states.map((s) => [s.allowed, s.remaining])).toEqual([[true, 2], [true, 1], [true, 0], [false, 0]]);
    expect(states[3].resetSeconds).toBeGreaterThan(0);
    expect(states[3].resetSeconds).toBeLessThanOrEqual(60);
    expect((await consumeBurst(`${key}-other`, 3)).allowed).toBe(true);
  });
});

const REDIS = "/usr/bin/redis-server";

describe.skipIf(!existsSync(REDIS))("burst limit shared through Redis (REDIS_URL)", () => {
  let redis: ReturnType<typeof spawn>;
  let url = "";
  beforeAll(async () => {
    const port = await new Promise<number>((resolve) => {
      const probe = createServer().listen(0, "127.0.0.1", () => {
        const { port } = probe.address() as { port: number };
        probe.close(() => resolve(port));
      });
    });
    redis = spawn(REDIS, ["--port", String(port), "--save", "", "--appendonly", "no"], { stdio: "ignore" });
    url = `redis://127.0.0.1:${port}`;
    await new Promise((r) => setTimeout(r, 300));
  });
  afterAll(() => redis?.kill());

  it("two instances of 5 calls each against a limit of 6 get exactly 6 between them", async () => {
    const key = `key_${Math.random()}`;
    const instance = () =>
      run(process.execPath, ["--import", "tsx", "tests/quota/burst-worker.ts", key, "6", "5"], { env: { ...process.env, REDIS_URL: url } }).then(
        ({ stdout }) => JSON.parse(stdout.trim().split("\n").pop()!).allowed as number,
      );
    const [a, b] = await Promise.all([instance(), instance()]);
    expect(a + b).toBe(6);
  }, 30_000);
});
