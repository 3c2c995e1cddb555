// The local fakes of the outside services, on loopback only:
// - an SMTP server (smtp-server) that keeps every message it receives in the
//   dev_mailbox table, where the app's development inbox page reads it (each
//   member sees only their own mail there);
// - an S3-compatible object store (s3rver) with the uploads bucket.
// Plain JavaScript on purpose: s3rver's dependency chain breaks under tsx.
// Started by scripts/stack.ts; prints "services ready" once both listen.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import S3rver from "s3rver";
import pg from "pg";
import fs from "node:fs";

const smtpPort = Number(process.env.FAKE_SMTP_PORT);
const s3Port = Number(process.env.FAKE_S3_PORT);
const s3Dir = process.env.FAKE_S3_DIR;
const bucket = process.env.S3_BUCKET;
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 });

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  banner: "heatsplit fake smtp",
  size: 5 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (mail) => {
        const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
        // who caused it (services/mail/mail.ts sets the header only for this catcher), for the development inbox
        const cause = mail.headers.get("x-heatsplit-caused-by");
        await pool.query(
          "insert into dev_mailbox (recipients, sender, subject, text_body, html_body, caused_by) values ($1, $2, $3, $4, $5, $6)",
          [to, session.envelope.mailFrom ? session.envelope.mailFrom.address : null, mail.subject ?? "", mail.text ?? "", typeof mail.html === "string" ? mail.html : null, typeof cause === "string" ? cause : null],
        );
        callback();
      })
      .catch((err) => {
        console.error("fake smtp: could not store message:", err.message);
        callback(new Error("mailbox unavailable"));
      });
  },
});

async function main() {
  fs.mkdirSync(s3Dir, { recursive: true });
  const s3 = new S3rver({
    port: s3Port,
    address: "127.0.0.1",
    directory: s3Dir,
    silent: true,
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await s3.run();
  await new Promise((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, "127.0.0.1", () => resolve());
  });
  console.log(`services ready: smtp 127.0.0.1:${smtpPort}, s3 127.0.0.1:${s3Port}`);

  const stop = async () => {
    await new Promise((r) => smtp.close(() => r()));
    await s3.close();
    await pool.end();
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

main().catch((e) => {
  console.error("services failed:", e.message);
  process.exit(1);
});
