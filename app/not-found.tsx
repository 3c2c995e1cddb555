import type { Metadata } from "next";
import { PublicFrame } from "@/components/shell/PublicFrame";
import { LinkButton } from "@/components/ui";

export const metadata: Metadata = { title: "Not found" };

/** A trace that stops short of its pad: an open circuit. */
function OpenTrace() {
  return (
    <svg aria-hidden="true" viewBox="0 0 240 64" className="h-16 w-60">
      <rect x="4" y="20" width="28" height="24" rx="4" fill="#b8652f" />
      <path d="M32 32h56l16-14h28" fill="none" stroke="#b8652f" strokeWidth="6" strokeLinecap="round" strokeLinejoin="round" />
      <path d="M150 18h18l16 14h24" fill="none" stroke="#d9d3c7" strokeWidth="6" strokeLinecap="round" strokeLinejoin="round" strokeDasharray="2 10" />
      <rect x="208" y="20" width="28" height="24" rx="4" fill="none" stroke="#8f8676" strokeWidth="2" strokeDasharray="4 4" />
      <path d="M138 10l6 16m0-16-6 16" stroke="#c0392b" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
}

export default function NotFound() {
  return (
    <PublicFrame>
      <div className="mx-auto flex max-w-2xl flex-col items-start gap-5 px-4 py-20 sm:px-6">
        <OpenTrace />
        <p className="font-mono text-sm text-copper-700">404 · open circuit</p>
        <h1 className="text-3xl font-semibold tracking-tight text-ink">Nothing is connected at this address</h1>
        <p className="text-ink-soft">
          The page may have moved, or the project, part or option it showed was deleted or belongs to a workspace you
          are not a member of.
        </p>
        <div className="flex flex-wrap gap-3">
          <LinkButton href="/projects" variant="primary">
            Go to projects
          </LinkButton>
          <LinkButton href="/" variant="secondary">
            Start page
          </LinkButton>
        </div>
      </div>
    </PublicFrame>
  );
}
