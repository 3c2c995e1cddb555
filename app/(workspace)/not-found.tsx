import { LinkButton } from "@/components/ui";

// A record of this workspace that is not there (or another workspace's):
// shown inside the shell, so the navigation stays at hand.
export default function WorkspaceNotFound() {
  return (
    <div className="mx-auto flex max-w-2xl flex-col items-start gap-4 px-4 py-16 sm:px-6">
      <p className="font-mono text-sm text-copper-700">404 · open circuit</p>
      <h1 className="text-3xl font-semibold tracking-tight text-ink">Nothing is connected at this address</h1>
      <p className="text-ink-soft">The project, part or option was deleted, or it belongs to a workspace you are not a member of.</p>
      <LinkButton href="/projects" variant="primary">
        Go to projects
      </LinkButton>
    </div>
  );
}
