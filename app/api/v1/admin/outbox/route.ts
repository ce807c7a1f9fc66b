import { listOutbox } from "@/api-core/mail/mailer";
import { readQuery } from "@/api-core/http/admin-input";
import { withSession } from "@/api-core/http/session-guard";
import { OutboxQuery } from "@/openapi/admin";

export const dynamic = "force-dynamic";

export const GET = withSession(async ({ url }) => Response.json({ messages: await listOutbox(readQuery(url, OutboxQuery).limit) }), { permission: "outbox:read" });
