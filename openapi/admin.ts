// The admin API (/api/v1/admin/…): session-authenticated routes of the team console, registered on
// the shared registry under their own tag. The same schemas validate the requests in the route handlers.
import { KEY_SCOPES, MIN_PASSWORD_LENGTH } from "@/api-core/access/types";
import { ROLES } from "@/db/schema";
import { registry } from "./registry";
import { z } from "./zod";

export const ADMIN_TAG = "Admin";
export const SESSION_COOKIE_SCHEME = "sessionCookie";

const time = (description: string) => z.number().int().nonnegative().openapi({ description: `${description} Milliseconds since the Unix epoch (UTC).`, example: 1767225600000 });
const id = (description: string, example: string) => z.string().min(1).max(100).openapi({ description, example });
const role = z.enum(ROLES).openapi({ description: "administrator: everything, every team. manager: members, invitations and keys of their team. auditor: reads their team's usage, request log and audit trail. member: their own keys and usage.", example: "member" });
const teamFilter = id("Only this team (administrators; others always see their own team only).", "team_lantern_ridge").optional();
const pageLimit = z.coerce.number().int().min(1).max(500).default(100).openapi({ description: "Entries per page (1–500).", example: 100 });
const before = z.coerce.number().int().positive().optional().openapi({ description: "Cursor: the `nextBefore` of the previous page (entries with a smaller id).", example: 4211 });

// ---- schemas ----

export const SessionUserSchema = z
  .object({ id: z.string(), email: z.string(), name: z.string(), role, teamId: z.string().nullable() })
  .openapi("SessionUser", { description: "The signed-in user." });

export const SignInBody = z
  .object({
    email: z.email().max(254).openapi({ description: "Your e-mail address.", example: "oduya@lantern-ridge.example" }),
    password: z.string().min(1).max(200).openapi({ description: "Your password.", example: "starlight-demo" }),
  })
  .openapi("SignIn");

export const TeamSchema = z.object({ id: z.string(), slug: z.string(), name: z.string(), createdAt: time("Created.") }).openapi("Team");
export const CreateTeamBody = z
  .object({
    slug: z.string().regex(/^[a-z0-9][a-z0-9-]{1,62}$/, "lowercase letters, digits and dashes, 2–63 characters").openapi({ description: "Short name used in URLs and the CLI.", example: "orion-deep-field" }),
    name: z.string().min(1).max(120).openapi({ description: "Display name.", example: "Orion Deep Field Survey" }),
  })
  .openapi("CreateTeam");

export const MemberSchema = SessionUserSchema.extend({ pending: z.boolean().openapi({ description: "Invited, not yet joined." }), createdAt: time("Created.") }).openapi("Member");
export const MembersQuery = z.object({ teamId: teamFilter });
export const SetRoleBody = z.object({ role }).openapi("SetRole");

export const InvitationSchema = z
  .object({ id: z.string(), teamId: z.string(), email: z.string(), role, invitedBy: z.string(), expiresAt: time("The link stops working."), usedAt: time("Used.").nullable(), createdAt: time("Sent.") })
  .openapi("Invitation");
export const InviteBody = z
  .object({
    email: z.email().max(254).openapi({ description: "Who to invite; the link is e-mailed there.", example: "ayla.ncube@lantern-ridge.example" }),
    name: z.string().min(1).max(120).optional().openapi({ description: "Their name (they can change it when accepting).", example: "Ayla Ncube" }),
    role: z.enum(["manager", "auditor", "member"]).openapi({ description: "Their role in the team. Administrators are created with the admin CLI.", example: "member" }),
    teamId: id("The team (administrators must give it; managers invite to their own team).", "team_lantern_ridge").optional(),
  })
  .openapi("Invite");
export const InvitedSchema = z.object({ invitationId: z.string(), userId: z.string(), expiresAt: time("The link stops working.") }).openapi("Invited");
export const AcceptInvitationBody = z
  .object({
    token: z.string().min(20).max(200).openapi({ description: "The token from the invitation link.", example: "q3D9x…" }),
    name: z.string().min(1).max(120).optional().openapi({ description: "Your name.", example: "Ayla Ncube" }),
    password: z.string().min(MIN_PASSWORD_LENGTH, `at least ${MIN_PASSWORD_LENGTH} characters`).max(200).openapi({ description: `Your new password, at least ${MIN_PASSWORD_LENGTH} characters.`, example: "a-long-passphrase" }),
  })
  .openapi("AcceptInvitation");

const scopes = z.array(z.enum(KEY_SCOPES)).min(1).max(KEY_SCOPES.length).openapi({ description: "compute: the compute endpoints; profiles:write: creating team cosmology profiles.", example: ["compute"] });
export const KeySchema = z
  .object({
    id: z.string(),
    teamId: z.string(),
    userId: z.string().nullable(),
    name: z.string(),
    prefix: z.string().openapi({ description: "The visible start of the key, to tell keys apart.", example: "cmv_8f3k2m" }),
    scopes: z.array(z.string()),
    monthlyUnits: z.number().int(),
    perMinute: z.number().int(),
    expiresAt: time("Stops working.").nullable(),
    revokedAt: time("Revoked.").nullable(),
    replacedBy: z.string().nullable().openapi({ description: "The key that replaced this one by rotation." }),
    lastUsedAt: time("Last call.").nullable(),
    createdAt: time("Issued."),
    status: z.enum(["active", "revoked", "expired"]),
  })
  .openapi("ApiKey", { description: "An API key without its secret." });
export const KeysQuery = z.object({ teamId: teamFilter, userId: id("Only keys of this user.", "user_demo_member").optional() });
export const IssueKeyBody = z
  .object({
    name: z.string().min(1).max(120).openapi({ description: "What the key is for.", example: "catalog pipeline" }),
    teamId: id("The team (administrators must give it; others issue in their own team).", "team_lantern_ridge").optional(),
    userId: id("The member the key belongs to (managers and administrators; a member's keys are always their own).", "user_demo_member").nullable().optional(),
    scopes: scopes.optional(),
    monthlyUnits: z.number().int().min(1).max(1e12).optional().openapi({ description: "Evaluation units per UTC calendar month (one per redshift evaluated). Default 10000000; members may not exceed it.", example: 10000000 }),
    perMinute: z.number().int().min(1).max(1e6).optional().openapi({ description: "Calls per minute (burst limit). Default 120; members may not exceed it.", example: 120 }),
    expiresAt: time("Optional expiry.").nullable().optional(),
  })
  .openapi("IssueKey");
export const IssuedKeySchema = z
  .object({ key: KeySchema, secret: z.string().openapi({ description: "The key itself, shown only in this answer: store it now.", example: "cmv_8f3k2m…" }) })
  .openapi("IssuedKey");
export const RotateKeyBody = z
  .object({ overlapSeconds: z.number().int().min(0).max(30 * 86400).default(86400).openapi({ description: "How long the old key keeps working (default one day, at most 30 days).", example: 86400 }) })
  .openapi("RotateKey");
export const RotatedKeySchema = IssuedKeySchema.extend({ previous: KeySchema }).openapi("RotatedKey");
export const KeyIdParams = z.object({ id: id("The key id.", "key_demo_member") });
export const MemberIdParams = z.object({ id: id("The user id.", "user_demo_member") });

export const UsageQuery = z.object({
  teamId: teamFilter,
  keyId: id("Only this key.", "key_demo_member").optional(),
  month: z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, "YYYY-MM").optional().openapi({ description: "UTC month of the per-key and per-team units, YYYY-MM; default this month.", example: "2026-07" }),
});
export const UsageSchema = z
  .object({
    month: z.string(),
    keys: z.array(z.object({ keyId: z.string(), teamId: z.string(), name: z.string(), prefix: z.string(), monthlyUnits: z.number(), units: z.number() })),
    teams: z.array(z.object({ teamId: z.string(), units: z.number() })),
    days: z.array(z.object({ day: z.string().openapi({ example: "2026-07-14" }), requests: z.number(), evaluations: z.number() })),
  })
  .openapi("Usage", { description: "Evaluation units per key and per team in one month, and calls and evaluations per UTC day of that month." });

export const RequestLogQuery = z.object({
  teamId: teamFilter,
  keyId: id("Only this key.", "key_demo_member").optional(),
  route: z.string().max(200).optional().openapi({ description: "Only this path.", example: "/api/v1/distances" }),
  status: z.coerce.number().int().min(100).max(599).optional().openapi({ description: "Only this HTTP status.", example: 429 }),
  from: z.coerce.number().int().nonnegative().optional().openapi({ description: "From this time (inclusive), ms since the epoch.", example: 1767225600000 }),
  to: z.coerce.number().int().nonnegative().optional().openapi({ description: "Until this time (exclusive), ms since the epoch.", example: 1769904000000 }),
  before,
  limit: pageLimit,
  format: z.enum(["json", "csv"]).default("json").openapi({ description: "csv: every matching entry as RFC 4180 CSV (no paging).", example: "json" }),
});
export const RequestLogEntrySchema = z
  .object({
    id: z.number(),
    at: time("When the call was answered."),
    keyId: z.string().nullable(),
    keyPrefix: z.string().nullable(),
    teamId: z.string().nullable(),
    method: z.string(),
    route: z.string(),
    status: z.number(),
    durationMs: z.number(),
    evaluations: z.number(),
    cosmologyHash: z.string().nullable(),
    cosmologyRef: z.string().nullable(),
    clientAddress: z.string().nullable(),
  })
  .openapi("RequestLogEntry");
const page = <T extends z.ZodType>(item: T, name: string) =>
  z.object({ entries: z.array(item), nextBefore: z.number().nullable().openapi({ description: "Pass as `before` for the next page; null on the last page." }) }).openapi(name);
export const RequestLogPage = page(RequestLogEntrySchema, "RequestLogPage");

export const AuditQuery = z.object({ teamId: teamFilter, action: z.string().max(60).optional().openapi({ description: "Only this action.", example: "key.issued" }), before, limit: pageLimit });
export const AuditEntrySchema = z
  .object({
    id: z.number(),
    at: time("When."),
    actorId: z.string().nullable().openapi({ description: "Who: a user id, a key id (API actions) or null (the admin CLI)." }),
    actorEmail: z.string().nullable(),
    teamId: z.string().nullable(),
    action: z.string().openapi({ example: "key.issued" }),
    targetType: z.string(),
    targetId: z.string().nullable(),
    detail: z.unknown(),
  })
  .openapi("AuditEntry");
export const AuditPage = page(AuditEntrySchema, "AuditPage");

export const OutboxQuery = z.object({ limit: pageLimit });
export const OutboxMessageSchema = z.object({ id: z.number(), at: time("Stored."), to: z.string(), subject: z.string(), text: z.string() }).openapi("OutboxMessage");

// ---- paths ----

/** RFC 9457 problem details (inline, so this module stands on its own). */
const problemSchema = z
  .looseObject({ type: z.string(), title: z.string(), status: z.number().int(), detail: z.string(), instance: z.string().optional() })
  .openapi({ description: "RFC 9457 problem details; `detail` says what to change." });

registry.registerComponent("securitySchemes", SESSION_COOKIE_SCHEME, {
  type: "apiKey",
  in: "cookie",
  name: "comova_api_session",
  description: "The console session (SameSite=Strict), set by POST /api/v1/admin/session.",
});

const PROBLEM_MEANINGS: Record<number, string> = {
  400: "Malformed JSON body.",
  401: "Not signed in (or the session expired).",
  403: "Your role does not allow this.",
  404: "No such object visible to you (another team's objects answer the same).",
  409: "Conflict with the current state (e.g. the slug or e-mail exists; the link was used).",
  422: "Invalid parameters; `errors` names each.",
  429: "Too many failed sign-ins; retry after `Retry-After` seconds.",
};
const problems = (...statuses: number[]) =>
  Object.fromEntries(statuses.map((s) => [String(s), { description: PROBLEM_MEANINGS[s], content: { "application/problem+json": { schema: problemSchema } } }]));
const json = (schema: z.ZodType, description: string) => ({ description, content: { "application/json": { schema } } });
const body = (schema: z.ZodType) => ({ body: { content: { "application/json": { schema } } } });

interface AdminOperation {
  method: "get" | "post" | "patch" | "delete";
  path: string;
  summary: string;
  description: string;
  request?: Record<string, unknown>;
  responses: Record<string, unknown>;
  public?: boolean;
}

function operation(op: AdminOperation): void {
  registry.registerPath({
    method: op.method,
    path: op.path,
    tags: [ADMIN_TAG],
    summary: op.summary,
    description: op.description,
    security: op.public ? [] : [{ [SESSION_COOKIE_SCHEME]: [] }],
    request: op.request,
    responses: { ...op.responses, ...problems(...(op.public ? [] : [401, 403]), 422) },
  } as Parameters<typeof registry.registerPath>[0]);
}

const list = (key: string, item: z.ZodType) => z.object({ [key]: z.array(item) });

operation({ method: "post", path: "/api/v1/admin/session", summary: "Sign in", public: true, description: "Checks e-mail and password and sets the session cookies (httpOnly; SameSite=Strict for this API, Lax for the console pages). Failed attempts are throttled per e-mail and per client address.", request: body(SignInBody), responses: { "200": json(z.object({ user: SessionUserSchema }), "Signed in."), ...problems(400, 429), "401": problems(401)["401"] } });
operation({ method: "get", path: "/api/v1/admin/session", summary: "Who am I", description: "The signed-in user.", responses: { "200": json(z.object({ user: SessionUserSchema }), "The user.") } });
operation({ method: "delete", path: "/api/v1/admin/session", summary: "Sign out", public: true, description: "Clears the session cookies.", responses: { "204": { description: "Signed out." } } });
operation({ method: "get", path: "/api/v1/admin/teams", summary: "List teams", description: "Administrators: every team; others: their own.", responses: { "200": json(list("teams", TeamSchema), "Teams.") } });
operation({ method: "post", path: "/api/v1/admin/teams", summary: "Create a team", description: "Administrators only.", request: body(CreateTeamBody), responses: { "201": json(z.object({ team: TeamSchema }), "Created."), ...problems(400, 409) } });
operation({ method: "get", path: "/api/v1/admin/members", summary: "List members", description: "Administrators, managers and auditors (their team).", request: { query: MembersQuery }, responses: { "200": json(list("members", MemberSchema), "Members, pending invitees included.") } });
operation({ method: "patch", path: "/api/v1/admin/members/{id}", summary: "Change a member's role", description: "Administrators; managers within their team (not to or from administrator, not themselves).", request: { params: MemberIdParams, ...body(SetRoleBody) }, responses: { "200": json(z.object({ member: SessionUserSchema }), "Changed."), ...problems(400, 404) } });
operation({ method: "get", path: "/api/v1/admin/invitations", summary: "List invitations", description: "Administrators and managers (their team).", request: { query: MembersQuery }, responses: { "200": json(list("invitations", InvitationSchema), "Invitations (never their tokens).") } });
operation({ method: "post", path: "/api/v1/admin/invitations", summary: "Invite a member", description: "E-mails a single-use link, valid 72 hours, to set a password. Without SMTP_URL the message goes to the local outbox.", request: body(InviteBody), responses: { "201": json(InvitedSchema, "Invited."), ...problems(400, 404, 409) } });
operation({ method: "post", path: "/api/v1/admin/invitations/accept", summary: "Accept an invitation", public: true, description: "Uses the link's token once: sets the password and signs in.", request: body(AcceptInvitationBody), responses: { "200": json(z.object({ user: SessionUserSchema }), "Joined and signed in."), ...problems(400, 404, 409) } });
operation({ method: "get", path: "/api/v1/admin/keys", summary: "List API keys", description: "Administrators: all; managers and auditors: their team; members: their own. Never secrets.", request: { query: KeysQuery }, responses: { "200": json(list("keys", KeySchema), "Keys.") } });
operation({ method: "post", path: "/api/v1/admin/keys", summary: "Issue an API key", description: "The secret is in this answer only. Administrators: any team; managers: their team; members: their own keys, default limits at most.", request: body(IssueKeyBody), responses: { "201": json(IssuedKeySchema, "Issued."), ...problems(400, 404) } });
operation({ method: "post", path: "/api/v1/admin/keys/{id}/revoke", summary: "Revoke an API key", description: "It stops working at once.", request: { params: KeyIdParams }, responses: { "200": json(z.object({ key: KeySchema }), "Revoked."), ...problems(404) } });
operation({ method: "post", path: "/api/v1/admin/keys/{id}/rotate", summary: "Rotate an API key", description: "Issues a new secret with the same settings; the old key keeps working for `overlapSeconds`, then expires. This month's units carry over.", request: { params: KeyIdParams, ...body(RotateKeyBody) }, responses: { "201": json(RotatedKeySchema, "Rotated."), ...problems(400, 404, 409) } });
operation({ method: "get", path: "/api/v1/admin/usage", summary: "Usage summary", description: "Units per key and team in a month and per day. Administrators: all; managers and auditors: their team; members: their keys.", request: { query: UsageQuery }, responses: { "200": json(UsageSchema, "Usage.") } });
operation({ method: "get", path: "/api/v1/admin/request-log", summary: "Request log", description: "Every keyed call, newest first, cursor-paged; `format=csv` exports every match. Administrators: all; auditors: their team.", request: { query: RequestLogQuery }, responses: { "200": { description: "A page (JSON) or the export (CSV).", content: { "application/json": { schema: RequestLogPage }, "text/csv": { schema: { type: "string" } } } } } });
operation({ method: "get", path: "/api/v1/admin/audit-trail", summary: "Audit trail", description: "Console and admin actions, newest first, append-only. Administrators: all; auditors: their team.", request: { query: AuditQuery }, responses: { "200": json(AuditPage, "A page.") } });
operation({ method: "get", path: "/api/v1/admin/outbox", summary: "Local mail outbox", description: "Messages stored instead of sent when no SMTP_URL is configured. Administrators only.", request: { query: OutboxQuery }, responses: { "200": json(list("messages", OutboxMessageSchema), "Newest first.") } });
