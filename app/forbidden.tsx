import type { Metadata } from "next";
import { LinkButton } from "@/components/ui/Button";

export const metadata: Metadata = { title: "Not allowed · Heatsplit" };

// Rendered (status 403) when requirePageMember() finds that the member's role
// lacks the page's permission.
export default function Forbidden() {
  return (
    <div className="mx-auto flex max-w-2xl flex-col items-start gap-4 px-4 py-16 sm:px-6">
      <p className="font-mono text-sm text-copper-700">403 · not for your role</p>
      <h1 className="text-3xl font-semibold tracking-tight text-ink">Your role does not include this page</h1>
      <p className="text-ink-soft">Roles are set by the workspace&rsquo;s admins. Ask one of them if you need access.</p>
      <LinkButton href="/home" variant="primary">
        Back to home
      </LinkButton>
    </div>
  );
}
