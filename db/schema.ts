import { sqliteTable, text, integer, primaryKey, uniqueIndex, index } from "drizzle-orm/sqlite-core";

// Times are stored as integer milliseconds since the Unix epoch (UTC).
const createdAt = () => integer("created_at").notNull();

export const teams = sqliteTable("teams", {
  id: text("id").primaryKey(),
  slug: text("slug").notNull().unique(),
  name: text("name").notNull(),
  createdAt: createdAt(),
});

/** Roles, from most to least powerful; what each may do is decided in api-core/access. */
export const ROLES = ["administrator", "manager", "auditor", "member"] as const;
export type Role = (typeof ROLES)[number];

export const users = sqliteTable("users", {
  id: text("id").primaryKey(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  /** scrypt hash; null until the user has accepted an invitation. */
  passwordHash: text("password_hash"),
  role: text("role", { enum: ROLES }).notNull(),
  teamId: text("team_id").references(() => teams.id),
  createdAt: createdAt(),
  disabledAt: integer("disabled_at"),
});

export const invitations = sqliteTable("invitations", {
  id: text("id").primaryKey(),
  teamId: text("team_id").notNull().references(() => teams.id),
  email: text("email").notNull(),
  role: text("role", { enum: ROLES }).notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  invitedBy: text("invited_by").notNull().references(() => users.id),
  expiresAt: integer("expires_at").notNull(),
  usedAt: integer("used_at"),
  createdAt: createdAt(),
});

export const apiKeys = sqliteTable(
  "api_keys",
  {
    id: text("id").primaryKey(),
    teamId: text("team_id").notNull().references(() => teams.id),
    userId: text("user_id").references(() => users.id),
    name: text("name").notNull(),
    /** The visible start of the key, for people to tell keys apart; never enough to use it. */
    prefix: text("prefix").notNull(),
    secretHash: text("secret_hash").notNull().unique(),
    /** JSON array of scopes, e.g. ["compute","profiles:write"]. */
    scopes: text("scopes", { mode: "json" }).$type<string[]>().notNull(),
    monthlyUnits: integer("monthly_units").notNull(),
    perMinute: integer("per_minute").notNull(),
    expiresAt: integer("expires_at"),
    revokedAt: integer("revoked_at"),
    /** Set on the old key when it is rotated: it keeps working until its expiresAt. */
    replacedBy: text("replaced_by"),
    lastUsedAt: integer("last_used_at"),
    createdAt: createdAt(),
  },
  (t) => [index("api_keys_team").on(t.teamId)],
);

/** Evaluation units spent per key and calendar month (UTC, "YYYY-MM"); the monthly quota reads this. */
export const usage = sqliteTable(
  "usage",
  {
    keyId: text("key_id").notNull().references(() => apiKeys.id),
    month: text("month").notNull(),
    units: integer("units").notNull(),
  },
  (t) => [primaryKey({ columns: [t.keyId, t.month] })],
);

/** Team cosmology profiles: immutable, a new row (version) for each change. */
export const profiles = sqliteTable(
  "profiles",
  {
    id: text("id").primaryKey(),
    teamId: text("team_id").notNull().references(() => teams.id),
    slug: text("slug").notNull(),
    version: integer("version").notNull(),
    title: text("title").notNull(),
    description: text("description"),
    parameters: text("parameters", { mode: "json" }).notNull(),
    hash: text("hash").notNull(),
    createdBy: text("created_by"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("profiles_team_slug_version").on(t.teamId, t.slug, t.version)],
);

/** One row for every keyed API call, written before the answer leaves. Never holds a secret. */
export const requestLog = sqliteTable(
  "request_log",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    at: integer("at").notNull(),
    keyId: text("key_id"),
    keyPrefix: text("key_prefix"),
    teamId: text("team_id"),
    method: text("method").notNull(),
    route: text("route").notNull(),
    status: integer("status").notNull(),
    durationMs: integer("duration_ms").notNull(),
    evaluations: integer("evaluations").notNull(),
    cosmologyHash: text("cosmology_hash"),
    cosmologyRef: text("cosmology_ref"),
    clientAddress: text("client_address"),
  },
  (t) => [index("request_log_team_at").on(t.teamId, t.at), index("request_log_key_at").on(t.keyId, t.at)],
);

/** Append-only trail of console and admin actions. */
export const auditTrail = sqliteTable(
  "audit_trail",
  {
    id: integer("id").primaryKey({ autoIncrement: true }),
    at: integer("at").notNull(),
    actorId: text("actor_id"),
    actorEmail: text("actor_email"),
    teamId: text("team_id"),
    action: text("action").notNull(),
    targetType: text("target_type").notNull(),
    targetId: text("target_id"),
    detail: text("detail", { mode: "json" }),
  },
  (t) => [index("audit_trail_team_at").on(t.teamId, t.at)],
);

/** The local fake mail outbox, used when no SMTP_URL is configured. */
export const outbox = sqliteTable("outbox", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  at: integer("at").notNull(),
  to: text("to").notNull(),
  subject: text("subject").notNull(),
  text: text("text").notNull(),
});
