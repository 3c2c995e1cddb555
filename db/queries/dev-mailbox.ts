import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// The development mailbox that the fake SMTP server fills (scripts/services.mjs).
export interface DevMailRecord {
  id: string;
  recipients: string[];
  subject: string;
  textBody: string;
  receivedAt: Date;
}

const DEV_INBOX_LIMIT = 100;

/** Newest first: mail addressed to `email`, and mail that `userId`'s actions caused. */
export async function listDevMailForUser({ email, userId }: { email: string; userId: string }, db: Knex = getDb()): Promise<DevMailRecord[]> {
  const rows = await db("dev_mailbox")
    .where((q) => q.whereRaw("? = any(recipients)", [email]).orWhere("caused_by", userId))
    .orderBy("id", "desc")
    .limit(DEV_INBOX_LIMIT)
    .select<{ id: string; recipients: string[]; subject: string; text_body: string; received_at: Date }[]>("id", "recipients", "subject", "text_body", "received_at");
  return rows.map((r) => ({ id: String(r.id), recipients: r.recipients, subject: r.subject, textBody: r.text_body, receivedAt: r.received_at }));
}
