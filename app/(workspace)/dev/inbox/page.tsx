import { notFound } from "next/navigation";
import { requirePageMember } from "@/app/_lib/access";
import { devInboxEnabled, listDevMailForWorkspace } from "@/app/_lib/accounts/dev-inbox";
import { appOrigin } from "@/app/_lib/request-guards";
import { PageHeader } from "@/components/ui/PageHeader";
import { EmptyState } from "@/components/ui/EmptyState";
import { MailBody } from "./MailBody";

export const metadata = { title: "Dev inbox · Heatsplit" };

const timeFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "medium" });

// Development only (HEATSPLIT_DEV_INBOX=1): the mail the fake SMTP server
// caught for this workspace's members and invited addresses, so sign-up,
// invite and reset links can be followed without a real mailbox.
export default async function DevInboxPage() {
  if (!devInboxEnabled()) notFound();
  const member = await requirePageMember("dev:inbox");
  const mail = await listDevMailForWorkspace(member);
  return (
    <>
      <PageHeader title="Development inbox" subtitle="Messages the local mail catcher received for members of this workspace and the people it invited. Not present in production." />
      {mail.length === 0 ? (
        <EmptyState title="No mail yet">Invite someone or ask for a password reset; the message appears here.</EmptyState>
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
