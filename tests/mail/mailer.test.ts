// The mail transport: without SMTP_URL every message lands in the local outbox table.
import { describe, expect, it } from "vitest";
import { listOutbox, sendMail } from "@/api-core/mail/mailer";
import { useFreshDatabase } from "../access/fresh-database";

useFreshDatabase();

describe("local fake outbox", () => {
  it("stores each message, newest first", async () => {
    delete process.env.SMTP_URL;
    await sendMail({ to: "a@example.org", subject: "first", text: "one" });
    await sendMail({ to: "b@example.org", subject: "second", text: "two\nlines" });
    const messages = await listOutbox(10);
    expect(messages.map((m) => [m.to, m.subject, m.text])).toEqual([
      ["b@example.org", "second", "two\nlines"],
      ["a@example.org", "first", "one"],
    ]);
  });
});
