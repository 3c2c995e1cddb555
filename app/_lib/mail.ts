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

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export async function sendMail({ to, subject, text, html }: MailMessage): Promise<void> {
  await transport().sendMail({ from: process.env.MAIL_FROM ?? "Heatsplit <no-reply@heatsplit.invalid>", to, subject, text, html });
}

/** Absolute link into the app; the secret goes in the fragment, which browsers never send to a server or in a Referer. */
export function appLink(path: string, fragment?: Record<string, string>): string {
  const origin = process.env.APP_ORIGIN ?? "http://127.0.0.1:3000";
  const hash = fragment ? `#${new URLSearchParams(fragment).toString()}` : "";
  return `${origin}${path}${hash}`;
}
