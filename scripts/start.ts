// Starts Comova: applies migrations, seeds the demo (unless COMOVA_DEMO=0), prints where to go, then
// serves the built app with `next start` on PORT (default 3000).
import { spawn } from "node:child_process";
import { createRequire } from "node:module";
import { migrateDatabase } from "@/db/migrate";
import { databaseUrl } from "@/db/client";
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from "@/db/seed";
import { demoKeySecret } from "@/api-core/access/demo-key";
import { MissingSessionSecretError, sessionSecret } from "@/api-core/access/session";

const port = process.env.PORT || "3000";
const withDemo = process.env.COMOVA_DEMO !== "0";

// Resolved once here (generated into the data folder outside production) and handed to next start.
try {
  process.env.SESSION_SECRET = sessionSecret();
} catch (error) {
  if (!(error instanceof MissingSessionSecretError)) throw error;
  console.error(`Comova cannot start: ${error.message}`);
  process.exit(1);
}
await migrateDatabase();
if (withDemo) await seedDemo();

console.log(`Comova on ${databaseUrl()}`);
console.log(`  console:  http://localhost:${port}/console`);
console.log(`  API docs: http://localhost:${port}/docs`);
if (withDemo) console.log(`  demo administrator: ${DEMO_USERS[0].email} / ${DEMO_PASSWORD}`);
if (withDemo) console.log(`  demo API key (${DEMO_USERS[2].email}): ${demoKeySecret()}`);

const nextBin = createRequire(import.meta.url).resolve("next/dist/bin/next");
const server = spawn(process.execPath, [nextBin, "start", "-p", port], { stdio: "inherit", env: process.env });
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => server.kill(signal));
server.on("exit", (code) => process.exit(code ?? 0));
