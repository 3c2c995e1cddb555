import "server-only";
import nodemailer, { type Transporter } from "nodemailer";

// Outgoing mail through SMTP_URL (locally the fake SMTP server, which keeps
// every message in dev_mailbox for the development inbox).
const globalForMail = globalThis as unknown as { heatsplitMail?: Transporter };

function transport(): Transporter {
  if (!globalForMail.heatsplitMail) {
    const url = process.env.SMTP_URL;
    if (!url) throw new Error("SMTP_URL is not set");
    globalForMail.heatsplitMail = nodemailer.createTransport(url);
  }
  return globalForMail.heatsplitMail;
}

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "[::1]"]);

/**
 * True only when mail goes to the local catcher that scripts/stack.ts starts
 * (plain SMTP on loopback, on its FAKE_SMTP_PORT). Any other SMTP_URL is a
 * real service, whose mail must never be readable in the app.
 */
export function mailGoesToLocalCatcher(): boolean {
  const port = process.env.FAKE_SMTP_PORT;
  try {
    const u = new URL(process.env.SMTP_URL ?? "");
    return Boolean(port) && u.protocol === "smtp:" && LOOPBACK_HOSTS.has(u.hostname) && u.port === port;
  } catch {
    return false;
  }
}

/** The development inbox exists only where HEATSPLIT_DEV_INBOX=1 AND mail goes to the local catcher. */
export function devInboxEnabled(): boolean {
  return process.env.HEATSPLIT_DEV_INBOX === "1" && mailGoesToLocalCatcher();
}

/** Header the local catcher stores as dev_mailbox.caused_by; never sent to a real service. */
export const CAUSED_BY_HEADER = "X-Heatsplit-Caused-By";

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** The user whose action sends this mail (null: a signed-out request). */
  causedBy?: string | null;
}

export async function sendMail({ to, subject, text, html, causedBy }: MailMessage): Promise<void> {
  const headers = causedBy && devInboxEnabled() ? { [CAUSED_BY_HEADER]: causedBy } : undefined;
  await transport().sendMail({ from: process.env.MAIL_FROM ?? "Heatsplit <no-reply@heatsplit.invalid>", to, subject, text, html, headers });
}

/** Absolute link into the app; the secret goes in the fragment, which browsers never send to a server or in a Referer. */
export function appLink(path: string, fragment?: Record<string, string>): string {
  const origin = process.env.APP_ORIGIN ?? "http://127.0.0.1:3000";
  const hash = fragment ? `#${new URLSearchParams(fragment).toString()}` : "";
  return `${origin}${path}${hash}`;
}
