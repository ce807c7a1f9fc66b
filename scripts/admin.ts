// The admin CLI: `npm run admin -- <command> [options]`, on the same DATABASE_URL as the server.
// Applies migrations first. Acts as the operator (audit entries have no actor).
import { parseArgs } from "node:util";
import { z } from "zod";
import { createTeam, createUser, issueKey, revokeKey } from "@/api-core/access/mutations";
import { findTeamBySlug, findUserByEmail, listKeys } from "@/api-core/access/reads";
import { KEY_SCOPES } from "@/api-core/access/types";
import { ProblemError } from "@/api-core/http/problem";
import { migrateDatabase } from "@/db/migrate";
import { ROLES } from "@/db/schema";

const USAGE = `Usage: npm run admin -- <command> [options]
  create-team --slug <slug> --name <name>
  create-user --email <e-mail> --name <name> --role <${ROLES.join("|")}> [--team <slug>] [--password <p>]
              (or the password in COMOVA_PASSWORD; administrators have no team)
  create-key  --team <slug> --name <label> [--monthly-units N] [--per-minute N]
              [--scopes ${KEY_SCOPES.join(",")}] [--user <e-mail>] [--expires <ISO time>]
              (prints the new secret alone on its last line; it is shown only once)
  revoke-key  <key id>
  list-keys   [--team <slug>]`;

const { positionals, values } = parseArgs({
  allowPositionals: true,
  options: Object.fromEntries(
    ["slug", "name", "email", "role", "team", "password", "monthly-units", "per-minute", "scopes", "user", "expires"].map((name) => [name, { type: "string" as const }]),
  ),
});

const count = z.coerce.number().int().positive();
const slug = z.string().regex(/^[a-z0-9][a-z0-9-]{1,62}$/, "lowercase letters, digits and dashes");

async function teamId(teamSlug: string | undefined): Promise<string> {
  const team = await findTeamBySlug(slug.parse(teamSlug));
  if (!team) throw new ProblemError(404, "not-found", `No team with slug "${teamSlug}"; create it with create-team.`);
  return team.id;
}

const commands: Record<string, () => Promise<void>> = {
  async "create-team"() {
    const team = await createTeam({ slug: slug.parse(values.slug), name: z.string().min(1).parse(values.name) }, null);
    console.log(`team ${team.id} ${team.slug}`);
  },
  async "create-user"() {
    const role = z.enum(ROLES).parse(values.role);
    const password = z.string().min(12, "at least 12 characters").parse(values.password ?? process.env.COMOVA_PASSWORD);
    const user = await createUser(
      { email: z.email().parse(values.email), name: z.string().min(1).parse(values.name), role, teamId: role === "administrator" ? null : await teamId(values.team), password },
      null,
    );
    console.log(`user ${user.id} ${user.email} ${user.role}`);
  },
  async "create-key"() {
    const owner = values.user ? await findUserByEmail(values.user) : undefined;
    if (values.user && !owner) throw new ProblemError(404, "not-found", `No user with e-mail ${values.user}.`);
    const issued = await issueKey(
      {
        teamId: await teamId(values.team),
        name: z.string().min(1).parse(values.name),
        userId: owner?.id ?? null,
        scopes: values.scopes ? z.array(z.enum(KEY_SCOPES)).parse(values.scopes.split(",")) : undefined,
        monthlyUnits: values["monthly-units"] ? count.parse(values["monthly-units"]) : undefined,
        perMinute: values["per-minute"] ? count.parse(values["per-minute"]) : undefined,
        expiresAt: values.expires ? z.iso.datetime().transform((t) => Date.parse(t)).parse(values.expires) : null,
      },
      {},
      null,
    );
    const { key } = issued;
    console.log(`key ${key.id} ${key.prefix}… scopes=${key.scopes.join(",")} monthly-units=${key.monthlyUnits} per-minute=${key.perMinute}`);
    console.log(issued.secret);
  },
  async "revoke-key"() {
    const key = await revokeKey(z.string().min(1, "the key id").parse(positionals[1]), {}, null);
    console.log(`key ${key.id} ${key.prefix}… ${key.status}`);
  },
  async "list-keys"() {
    const keys = await listKeys({}, { teamId: values.team ? await teamId(values.team) : undefined });
    for (const key of keys) console.log([key.id, `${key.prefix}…`, key.status, key.teamId, key.name, key.scopes.join(","), key.monthlyUnits, key.perMinute].join("\t"));
  },
};

const command = commands[positionals[0] ?? ""];
if (!command) {
  console.error(USAGE);
  process.exit(2);
}
try {
  await migrateDatabase();
  await command();
} catch (error) {
  const message = error instanceof ProblemError ? error.detail : error instanceof z.ZodError ? z.prettifyError(error) : String(error);
  console.error(`admin ${positionals[0]}: ${message}`);
  process.exit(1);
}
