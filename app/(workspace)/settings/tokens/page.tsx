import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { listApiTokensByUser, type ApiTokenRecord } from "@/db/queries/api-tokens";
import { Badge, PageHeader, Panel, Table, TBody, THead, Td, Th, Tr } from "@/components/ui";
import { CreateTokenForm, RevokeTokenForm } from "./TokenForms";

export const metadata: Metadata = { title: "API tokens" };

const when = (iso: string | null) => (iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : "—");

function state(t: ApiTokenRecord, now: number): { label: string; tone: "ok" | "over" | "neutral" } {
  if (t.revokedAt) return { label: "revoked", tone: "neutral" };
  if (Date.parse(t.expiresAt) <= now) return { label: "expired", tone: "over" };
  return { label: "active", tone: "ok" };
}

export default async function TokensPage() {
  const member = await requirePageMember("token:own");
  const tokens = await listApiTokensByUser({ userId: member.user.id, workspaceId: member.workspace.id });
  // eslint-disable-next-line react-hooks/purity -- a server component renders once per request: "now" is the request's time
  const now = Date.now();
  return (
    <>
      <PageHeader
        title="API tokens"
        subtitle={`Personal tokens for scripts and CI in ${member.workspace.name}. A token can do what your role can do here, and no more; if your role changes, so does the token's.`}
      />
      <div className="flex flex-col gap-6">
        <Panel title="New token" description="Send it as “Authorization: Bearer hs_…”. We keep only a hash: copy it when it is shown.">
          <CreateTokenForm />
        </Panel>
        <Table caption={`${tokens.length} token${tokens.length === 1 ? "" : "s"}`}>
          <THead>
            <Tr>
              <Th>Name</Th>
              <Th>State</Th>
              <Th>Created</Th>
              <Th>Expires</Th>
              <Th>Last used</Th>
              <Th>
                <span className="sr-only">Revoke</span>
              </Th>
            </Tr>
          </THead>
          <TBody>
            {tokens.map((t) => {
              const s = state(t, now);
              return (
                <Tr key={t.id} data-testid="token-row">
                  <Td>{t.name}</Td>
                  <Td>
                    <Badge tone={s.tone}>{s.label}</Badge>
                  </Td>
                  <Td>{when(t.createdAt)}</Td>
                  <Td>{when(t.expiresAt)}</Td>
                  <Td>{when(t.lastUsedAt)}</Td>
                  <Td className="text-right">{s.label === "active" && <RevokeTokenForm id={t.id} name={t.name} />}</Td>
                </Tr>
              );
            })}
          </TBody>
        </Table>
        <p className="text-sm text-ink-soft">
          curl examples for evaluate, sweep and reading a project&apos;s options are in <code className="font-mono text-xs">docs/API.md</code>. Pages and
          forms always need a signed-in session; tokens work on <code className="font-mono text-xs">/api/v1</code> only.
        </p>
      </div>
    </>
  );
}
