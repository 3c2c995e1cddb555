import { notFound } from "next/navigation";
import { requirePageMember } from "@/app/_lib/access";
import { devInboxEnabled, listDevMailForMember } from "@/services/mail/dev-inbox";
import { appOrigin } from "@/app/_lib/request-guards";
import { PageHeader } from "@/components/ui/PageHeader";
import { EmptyState } from "@/components/ui/EmptyState";
import { MailBody } from "./MailBody";

export const metadata = { title: "Dev inbox · Heatsplit" };

const timeFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "medium" });

// Development only (HEATSPLIT_DEV_INBOX=1 and mail going to the local fake
// SMTP server): the reader's own mail, i.e. messages addressed to them and
// messages their actions caused, the latter without their links (a link in
// someone else's mail would let the reader act as that person).
export default async function DevInboxPage() {
  if (!devInboxEnabled()) notFound();
  const member = await requirePageMember("dev:inbox");
  const mail = await listDevMailForMember(member);
  return (
    <>
      <PageHeader title="Development inbox" subtitle="Messages the local mail catcher received for you, and the ones your actions sent to others (their links withheld: only the recipient may follow them). Not present in production." />
      {mail.length === 0 ? (
        <EmptyState title="No mail yet">Mail addressed to you, or sent because of something you did, appears here.</EmptyState>
      ) : (
        <ol className="flex flex-col gap-4">
          {mail.map((m) => (
            <li key={m.id} className="rounded-panel border border-paper-line bg-paper-raised shadow-panel" data-testid="dev-mail">
              <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-paper-line px-5 py-3">
                <h2 className="text-base font-semibold text-ink">{m.subject}</h2>
                <p className="font-mono text-xs text-ink-soft">
                  to {m.recipients.join(", ")} · {timeFormat.format(m.receivedAt)}
                </p>
              </header>
              <MailBody text={m.textBody} origin={appOrigin()} />
            </li>
          ))}
        </ol>
      )}
    </>
  );
}
