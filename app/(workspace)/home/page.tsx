import { requirePageMember } from "@/app/_lib/access";
import { PERMISSIONS, can, type Permission } from "@/lib/roles";
import { PageHeader } from "@/components/ui/PageHeader";
import { Panel } from "@/components/ui/Panel";
import { RoleBadge } from "@/components/ui/Badge";
import { LinkButton } from "@/components/ui/Button";

export const metadata = { title: "Home · Heatsplit" };

// What each permission lets a member do, in the words the home page uses.
const ABILITIES: Record<Permission, string> = {
  read: "See the workspace's projects, parts and design options",
  "members:manage": "Invite members, change roles, remove members",
  "workspace:settings": "Change the workspace settings",
  "project:write": "Create and edit projects",
  "part:write": "Add and edit parts in the library",
  "option:write": "Create and edit design options",
  "option:submit": "Submit design options for review",
  "option:review": "Review design options",
  "derating:write": "Set derating rules",
  "option:choose": "Choose the design option to build",
  "bench:write": "Record bench measurements",
  "job:start": "Start long sweeps, Monte Carlo runs and reports in the background",
  "token:own": "Create personal API tokens",
  "dev:inbox": "Read your own mail in the development inbox (local stacks only)",
};

export default async function HomePage() {
  const member = await requirePageMember();
  const abilities = (Object.keys(PERMISSIONS) as Permission[]).filter((p) => can(member.role, p));
  return (
    <>
      <PageHeader
        title={`Hello, ${member.user.displayName}`}
        subtitle={`You are working in ${member.workspace.name}.`}
        meta={<RoleBadge role={member.role} />}
        actions={
          <LinkButton href="/projects" variant="primary">
            Go to projects
          </LinkButton>
        }
      />
      <Panel title="What your role allows" description="Roles are set by the workspace's admins.">
        <ul className="list-disc space-y-1 pl-5 text-sm text-ink" data-testid="abilities">
          {abilities.map((p) => (
            <li key={p}>{ABILITIES[p]}</li>
          ))}
        </ul>
      </Panel>
    </>
  );
}
