import { requirePageMember } from "@/app/_lib/access";
import { listMembersByWorkspace } from "@/db/queries/members";
import { listOpenInvitesByWorkspace } from "@/db/queries/invites";
import { PageHeader } from "@/components/ui/PageHeader";
import { Panel } from "@/components/ui/Panel";
import { RoleBadge } from "@/components/ui/Badge";
import { Table, TBody, THead, Td, Th, Tr } from "@/components/ui/Table";
import { InviteForm } from "./InviteForm";
import { ChangeRoleForm, RemoveMemberForm, RevokeInviteForm } from "./MemberRowForms";

export const metadata = { title: "Members · Heatsplit" };

const dateFormat = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium" });

export default async function MembersPage() {
  const member = await requirePageMember("members:manage");
  const [members, invites] = await Promise.all([listMembersByWorkspace(member.workspace.id), listOpenInvitesByWorkspace(member.workspace.id)]);
  return (
    <>
      <PageHeader title="Members" subtitle={`Who works in ${member.workspace.name}, and with which role. A workspace always keeps at least one admin.`} />
      <div className="flex flex-col gap-6">
        <Panel title="Invite someone" description="We e-mail them a link that works for 7 days.">
          <InviteForm />
        </Panel>
        <Table caption={`${members.length} member${members.length === 1 ? "" : "s"}`}>
          <THead>
            <Tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Role</Th>
              <Th>Joined</Th>
              <Th>
                <span className="sr-only">Remove</span>
              </Th>
            </Tr>
          </THead>
          <TBody>
            {members.map((m) => (
              <Tr key={m.userId} data-testid="member-row">
                <Td>
                  {m.displayName}
                  {m.userId === member.user.id && <span className="ml-2 text-xs text-ink-faint">(you)</span>}
                </Td>
                <Td className="font-mono text-xs">{m.email}</Td>
                <Td>
                  <ChangeRoleForm userId={m.userId} role={m.role} name={m.displayName} />
                </Td>
                <Td>{dateFormat.format(m.joinedAt)}</Td>
                <Td className="text-right">
                  <RemoveMemberForm userId={m.userId} name={m.displayName} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
        {invites.length > 0 && (
          <Table caption="Open invitations">
            <THead>
              <Tr>
                <Th>E-mail</Th>
                <Th>Role</Th>
                <Th>Expires</Th>
                <Th>
                  <span className="sr-only">Withdraw</span>
                </Th>
              </Tr>
            </THead>
            <TBody>
              {invites.map((i) => (
                <Tr key={i.id}>
                  <Td className="font-mono text-xs">{i.email}</Td>
                  <Td>
                    <RoleBadge role={i.role} />
                  </Td>
                  <Td>{dateFormat.format(i.expiresAt)}</Td>
                  <Td className="text-right">
                    <RevokeInviteForm inviteId={i.id} email={i.email} />
                  </Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
      </div>
    </>
  );
}
