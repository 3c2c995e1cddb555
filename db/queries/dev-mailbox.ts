import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// The development mailbox that the fake SMTP server fills (scripts/services.ts).
export interface DevMailRecord {
  id: string;
  recipients: string[];
  subject: string;
  textBody: string;
  receivedAt: Date;
}

const DEV_INBOX_LIMIT = 100;

/** Newest first; only messages with at least one of the given recipients. */
export async function listDevMailByRecipients(recipients: string[], db: Knex = getDb()): Promise<DevMailRecord[]> {
  if (recipients.length === 0) return [];
  const rows = await db("dev_mailbox")
    .whereRaw("recipients && ?::text[]", [recipients])
    .orderBy("id", "desc")
    .limit(DEV_INBOX_LIMIT)
    .select<{ id: string; recipients: string[]; subject: string; text_body: string; received_at: Date }[]>("id", "recipients", "subject", "text_body", "received_at");
  return rows.map((r) => ({ id: String(r.id), recipients: r.recipients, subject: r.subject, textBody: r.text_body, receivedAt: r.received_at }));
}
