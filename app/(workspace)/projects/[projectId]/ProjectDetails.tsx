"use client";

import { useRef, useState } from "react";
import useSWR from "swr";
import { Button, FormMessage, Panel } from "@/components/ui";
import { formatQuantity } from "@/models/input/units";
import type { ProjectRecord } from "@/db/queries/projects";
import { projectInputSchema, STATUS_LABELS, TOPOLOGY_LABELS } from "@/lib/projects/schema";
import { ProjectFields, projectFormObject } from "../_components/ProjectFields";
import { projectFormText } from "../_components/projectText";
import { ApiError, fetchJson, getJson, issuesByPath } from "@/lib/api-client";
import { useAfterChange } from "@/components/data/useAfterChange";

type ProjectResponse = { project: ProjectRecord };

/**
 * The project's data with an edit form. The form is checked with the same
 * schema the PATCH handler uses; a valid edit shows at once (optimistic) and
 * rolls back if the server refuses it.
 */
export function ProjectDetails({ project: initial, canEdit }: { project: ProjectRecord; canEdit: boolean }) {
  const key = `/api/v1/projects/${initial.id}`;
  const { data, mutate } = useSWR<ProjectResponse>(key, getJson, { fallbackData: { project: initial }, revalidateOnMount: false });
  const project = data?.project ?? initial;
  const [editing, setEditing] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const afterChange = useAfterChange();

  async function save(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const raw = projectFormObject(event.currentTarget);
    const parsed = projectInputSchema.safeParse(raw);
    if (!parsed.success) {
      setErrors(issuesByPath(parsed.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }))));
      setMessage({ tone: "error", text: "Check the highlighted fields." });
      return;
    }
    setErrors({});
    setEditing(false);
    try {
      await mutate(fetchJson<ProjectResponse>(key, { method: "PATCH", body: raw }), {
        optimisticData: { project: { ...project, ...parsed.data, efficiencyTarget: parsed.data.efficiencyTarget ?? null, notes: parsed.data.notes ?? "", status: parsed.data.status ?? project.status } },
        rollbackOnError: true,
        revalidate: false,
      });
      setMessage({ tone: "success", text: "Project saved." });
      await afterChange();
    } catch (e) {
      setEditing(true);
      if (e instanceof ApiError) setErrors(issuesByPath(e.issues));
      setMessage({ tone: "error", text: e instanceof Error ? e.message : "The project was not saved." });
    }
  }

  const rows: [string, string][] = [
    ["Topology", TOPOLOGY_LABELS[project.topology]],
    ["Status", STATUS_LABELS[project.status]],
    ["Vin min / nom / max", `${project.vinMin} / ${project.vinNom} / ${project.vinMax} V`],
    ["Outputs", project.outputs.map((o) => `${o.label}: ${o.voltage} V / ${o.current} A`).join(", ")],
    ["Switching frequency", formatQuantity(project.fsw, "frequency")],
    ["Max ambient", `${project.ambientMax} °C`],
    ["Efficiency target", project.efficiencyTarget === null ? "—" : `${Number((project.efficiencyTarget * 100).toPrecision(4))} %`],
  ];
  return (
    <Panel
      title="Project data"
      actions={
        canEdit && !editing ? (
          <Button size="sm" variant="secondary" onClick={() => (setEditing(true), setMessage(null))}>
            Edit project
          </Button>
        ) : undefined
      }
    >
      {message && <FormMessage tone={message.tone} message={message.text} className="mb-4" />}
      {editing ? (
        <form ref={formRef} onSubmit={save} className="flex flex-col gap-5" noValidate aria-label="Edit project">
          <ProjectFields initial={projectFormText(project)} errors={errors} />
          <div className="flex gap-2">
            <Button type="submit">Save project</Button>
            <Button variant="ghost" onClick={() => (setEditing(false), setErrors({}))}>
              Cancel
            </Button>
          </div>
        </form>
      ) : (
        <dl className="grid gap-x-8 gap-y-3 sm:grid-cols-2 lg:grid-cols-3">
          {rows.map(([label, value]) => (
            <div key={label}>
              <dt className="text-xs font-medium tracking-wide text-ink-faint">{label}</dt>
              <dd className="font-mono text-sm text-ink tabular-nums">{value}</dd>
            </div>
          ))}
          {project.notes && (
            <div className="sm:col-span-2 lg:col-span-3">
              <dt className="text-xs font-medium tracking-wide text-ink-faint">Notes</dt>
              <dd className="text-sm whitespace-pre-line text-ink">{project.notes}</dd>
            </div>
          )}
        </dl>
      )}
    </Panel>
  );
}
