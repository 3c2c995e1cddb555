import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { MODEL_DEFAULT_DERATING } from "@/services/derating/policy";
import { getDeratingByWorkspace } from "@/db/queries/derating";
import { formatQuantity } from "@/models/input/units";
import { PART_TYPES } from "@/models/policy";
import { Badge, Caution, PageHeader, Panel } from "@/components/ui";
import { DeratingForm, type DeratingFormValues } from "./DeratingForm";

export const metadata: Metadata = { title: "Derating policy" };

export default async function DeratingPage() {
  const member = await requirePageMember("read");
  const set = await getDeratingByWorkspace(member.workspace.id);
  const policy = set ?? MODEL_DEFAULT_DERATING;
  const values: DeratingFormValues = {
    tjMargin: Object.fromEntries(PART_TYPES.map((p) => [p, formatQuantity(policy.tjMargin[p], "temperatureDifference")])) as DeratingFormValues["tjMargin"],
    vgsMaxFraction: `${Number((policy.vgsMaxFraction * 100).toPrecision(4))} %`,
    minHeadroomAbovePlateau: formatQuantity(policy.minHeadroomAbovePlateau, "voltage"),
  };
  const editable = can(member.role, "derating:write");
  return (
    <>
      <PageHeader
        title="Derating policy"
        subtitle={`The margins every budget, comparison and review in ${member.workspace.name} is held to. When set, it replaces the derating block of each design document.`}
        meta={set ? <Badge tone="ok">workspace policy</Badge> : <Badge>model defaults (not set yet)</Badge>}
      />
      <div className="flex flex-col gap-6">
        <Panel
          title="Margins"
          description={
            set?.updatedBy
              ? `Last changed by ${set.updatedBy.displayName}, ${set.updatedAt.slice(0, 16).replace("T", " ")} UTC. Every change is in each project's activity log.`
              : "The defaults are common practice (25 K below Tj(max), 80 % of Vgs(max), 4 V above the plateau); set your team's own."
          }
        >
          <DeratingForm values={values} editable={editable} />
          {!editable && <p className="mt-4 text-sm text-ink-soft">A reviewer or an admin sets the policy; you can read it here.</p>}
        </Panel>
        <Caution variant="full" />
      </div>
    </>
  );
}
