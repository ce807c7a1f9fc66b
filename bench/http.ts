// HTTP benchmark: `npm run bench:http` (after `npm run build`). Starts the built server on a temporary
// database, then times a baseline, 1e5 and 1e6 redshifts POSTed to /distances, and a 1e6-row CSV
// catalog, with the server's peak RSS (VmHWM of the next-server process). Prints figures; no assertions.
import { execFile, spawn } from "node:child_process";
import { request as httpRequest } from "node:http";
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";

const folder = mkdtempSync(path.join(tmpdir(), "comova-bench-"));
const databaseUrl = `file:${path.join(folder, "bench.db")}`;
const env = { ...process.env, DATABASE_URL: databaseUrl, COMOVA_DEMO: "0", NEXT_TELEMETRY_DISABLED: "1" };

const port = await new Promise<number>((resolve) => {
  const probe = createServer().listen(0, "127.0.0.1", () => {
    const { port } = probe.address() as { port: number };
    probe.close(() => resolve(port));
  });
});
const base = `http://127.0.0.1:${port}`;
const server = spawn(process.execPath, ["--import", "tsx", "scripts/start.ts"], { env: { ...env, PORT: String(port) }, stdio: "ignore", detached: true });

function stop() {
  try {
    process.kill(-server.pid!, "SIGTERM");
  } catch {
    // already gone
  }
  rmSync(folder, { recursive: true, force: true });
}

/** Descendant of the start script that runs next (the process serving the requests). */
function nextServerPid(): number {
  const children = (pid: number) =>
    readdirSync("/proc")
      .filter((name) => /^\d+$/.test(name))
      .filter((name) => {
        try {
          return Number(readFileSync(`/proc/${name}/stat`, "utf8").split(") ")[1].split(" ")[1]) === pid;
        } catch {
          return false;
        }
      })
      .map(Number);
  const all: number[] = [];
  for (let queue = [server.pid!]; queue.length; ) {
    const next = children(queue.shift()!);
    all.push(...next);
    queue.push(...next);
  }
  const rss = (pid: number) => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, "utf8"))?.[1] ?? 0);
  return all.sort((a, b) => rss(b) - rss(a))[0];
}

const statusKiB = (pid: number, field: string) => Number(new RegExp(`${field}:\\s+(\\d+)`).exec(readFileSync(`/proc/${pid}/status`, "utf8"))![1]);
/** Resets VmHWM to the current RSS (Linux: write 5 to clear_refs). */
const resetPeak = (pid: number) => writeFileSync(`/proc/${pid}/clear_refs`, "5");
const mib = (kib: number) => `${(kib / 1024).toFixed(0)} MiB`;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

interface Answer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: Buffer;
}

/** One HTTP call with node:http (undici's fetch reads a large answer several times slower than curl does). */
function call(method: string, url: string, headers: Record<string, string> = {}, body?: string): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const request = httpRequest(url, { method, headers: body === undefined ? headers : { ...headers, "content-length": String(Buffer.byteLength(body)) } }, (response) => {
      const chunks: Buffer[] = [];
      response.on("data", (chunk: Buffer) => chunks.push(chunk));
      response.on("end", () => resolve({ status: response.statusCode!, headers: response.headers, body: Buffer.concat(chunks) }));
      response.on("error", reject);
    });
    request.on("error", reject);
    request.end(body);
  });
}

async function timed(run: () => Promise<Answer>): Promise<{ ms: number; serverMs: number | null; bytes: number }> {
  const started = performance.now();
  const answer = await run();
  const ms = performance.now() - started;
  if (answer.status !== 200) throw new Error(`${answer.status}: ${answer.body.toString("utf8", 0, 300)}`);
  const timing = /dur=([\d.]+)/.exec(String(answer.headers["server-timing"] ?? ""));
  return { ms, serverMs: timing ? Number(timing[1]) : null, bytes: answer.body.byteLength };
}

/** Streams a generated catalog of `rows` rows as a chunked text/csv upload; answers the number of lines that came back. */
function uploadCatalog(url: string, headers: Record<string, string>, rows: number): Promise<number> {
  return new Promise((resolve, reject) => {
    const request = httpRequest(url, { method: "POST", headers: { ...headers, "content-type": "text/csv" } }, (response) => {
      if (response.statusCode !== 200) reject(new Error(`catalog: status ${response.statusCode}`));
      let lines = 0;
      response.on("data", (chunk: Buffer) => {
        for (let i = chunk.indexOf(10); i >= 0; i = chunk.indexOf(10, i + 1)) lines++;
      });
      response.on("end", () => resolve(lines));
      response.on("error", reject);
    });
    request.on("error", reject);
    let made = 0;
    const writeMore = () => {
      while (made < rows) {
        let text = made === 0 ? "id,z\n" : "";
        for (let i = 0; i < 10_000 && made < rows; i++, made++) text += `gal-${made},${((made * 7919) % 50_000) / 10_000}\n`;
        if (!request.write(text)) return void request.once("drain", writeMore);
      }
      request.end();
    };
    writeMore();
  });
}

function redshifts(n: number): number[] {
  let state = 1;
  return Array.from({ length: n }, () => {
    state = (state * 1103515245 + 12345) % 2147483648; // LCG: reproducible input
    return (5 * (state + 1)) / 2147483649;
  });
}

try {
  const deadline = Date.now() + 60_000;
  while (!(await fetch(`${base}/api/v1/health`).then((r) => r.ok, () => false))) {
    if (Date.now() > deadline) throw new Error("the server did not start; run `npm run build` first");
    await new Promise((r) => setTimeout(r, 200));
  }
  const admin = (...args: string[]) => promisify(execFile)(process.execPath, ["--import", "tsx", "scripts/admin.ts", ...args], { env });
  await admin("create-team", "--slug", "bench", "--name", "Benchmark");
  const key = (await admin("create-key", "--team", "bench", "--name", "bench", "--monthly-units", "1000000000", "--per-minute", "100000")).stdout.trim().split("\n").pop()!;
  const headers = { authorization: `Bearer ${key}` };
  const pid = nextServerPid();
  // The body is serialized once, outside the timing: the client's own JSON encoding is not the server's cost.
  const postDistances = (z: number[]) => {
    const body = JSON.stringify({ z, cosmology: "planck18" });
    return () => call("POST", `${base}/api/v1/distances`, { ...headers, "content-type": "application/json" }, body);
  };

  // Warm up the routes (first calls load the bundles and build the model).
  for (let i = 0; i < 5; i++) await timed(postDistances([1]));

  const health: number[] = [];
  const one: { ms: number; serverMs: number | null }[] = [];
  for (let i = 0; i < 30; i++) health.push((await timed(() => call("GET", `${base}/api/v1/health`))).ms);
  const single = postDistances([1]);
  for (let i = 0; i < 30; i++) one.push(await timed(single));
  const baseline = median(one.map((r) => r.ms));

  const rows: string[][] = [];
  const report = (label: string, ms: number, extra: string) => rows.push([label, `${ms.toFixed(1)} ms`, `${(ms / baseline).toFixed(1)}×`, extra]);
  report("GET /health (median of 30)", median(health), "");
  report("POST /distances, 1 redshift (median of 30)", baseline, `server ${median(one.map((r) => r.serverMs ?? 0)).toFixed(1)} ms`);

  for (const catalogRows of [100_000, 1_000_000, 2_000_000]) {
    const rssBefore = statusKiB(pid, "VmRSS");
    resetPeak(pid);
    const started = performance.now();
    const lines = await uploadCatalog(`${base}/api/v1/catalogs?cosmology=planck18&quantities=comovingDistance,luminosityDistance,distanceModulus,lookbackTime`, headers, catalogRows);
    const catalogMs = performance.now() - started;
    if (lines !== catalogRows + 1) throw new Error(`catalog: ${lines} lines for ${catalogRows} rows`);
    report(`POST /catalogs, ${catalogRows.toLocaleString("en")} CSV rows, 4 quantities`, catalogMs, `${((catalogRows / catalogMs) * 1000).toFixed(0)} rows/s, server RSS ${mib(rssBefore)} before, peak ${mib(statusKiB(pid, "VmHWM"))}`);
  }

  for (const n of [100_000, 1_000_000]) {
    const post = postDistances(redshifts(n));
    const runs = [];
    resetPeak(pid);
    for (let i = 0; i < (n === 100_000 ? 5 : 2); i++) runs.push(await timed(post));
    const best = runs.sort((a, b) => a.ms - b.ms)[0];
    report(`POST /distances, ${n.toLocaleString("en")} redshifts (best of ${runs.length})`, best.ms, `server ${best.serverMs?.toFixed(1)} ms, ${(best.bytes / 2 ** 20).toFixed(1)} MiB answer, peak RSS ${mib(statusKiB(pid, "VmHWM"))}`);
  }

  const widths = [0, 1, 2, 3].map((i) => Math.max(...rows.map((r) => r[i].length)));
  console.log(`Comova HTTP benchmark (${base}, Node ${process.version}); ratios are to the 1-redshift call`);
  for (const row of rows) console.log(row.map((cell, i) => (i === 1 || i === 2 ? cell.padStart(widths[i]) : cell.padEnd(widths[i]))).join("  "));
} finally {
  stop();
}
