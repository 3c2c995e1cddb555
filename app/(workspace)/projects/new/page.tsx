import type { Metadata } from "next";
import { requirePageMember } from "@/app/_lib/access";
import { PageHeader, Panel } from "@/components/ui";
import { NewProjectForm } from "./NewProjectForm";

export const metadata: Metadata = { title: "New project" };

export default async function NewProjectPage() {
  await requirePageMember("project:write");
  return (
    <>
      <PageHeader
        title="New project"
        subtitle="One converter: its input range, outputs, switching frequency and worst ambient. Design options for its gate drives come next."
        back={{ href: "/projects", label: "Projects" }}
      />
      <Panel>
        <NewProjectForm />
      </Panel>
    </>
  );
}
