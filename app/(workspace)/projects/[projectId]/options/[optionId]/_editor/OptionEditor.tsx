"use client";

import { useEffect, useMemo, useState } from "react";
import { useAfterChange } from "@/components/data/useAfterChange";
import { Button, Panel } from "@/components/ui";
import type { OptionRecord } from "@/db/queries/options";
import { getAt } from "@/models/documentPath";
import { fetchJson } from "@/lib/api-client";
import { EditorContext, type EditorApi } from "./EditorContext";
import { ChainDiagram } from "./ChainDiagram";
import { ElementPanel } from "./ElementPanel";
import { OperatingPanels } from "./OperatingPanels";
import { IssueList, selectionForPath } from "./IssueList";
import { JsonView } from "./JsonView";
import { OptionHeader } from "./OptionHeader";
import { RevisionHistory, revisionsKey, type RevisionList } from "./RevisionHistory";
import { SaveBar } from "./SaveBar";
import { useOptionEditor, type Snapshot } from "./useOptionEditor";

export interface OptionEditorProps {
  option: OptionRecord;
  projectName: string;
  initial: Snapshot;
  revisions: RevisionList;
  canWrite: boolean;
}

/** THE editor of one design option: the chain diagram, the selected element's form, corners, history, save. */
export function OptionEditor({ option, projectName, initial, revisions, canWrite }: OptionEditorProps) {
  const ed = useOptionEditor({ optionId: option.id, initial });
  const [selected, setSelected] = useState("positions.0.drive");
  const [view, setView] = useState<"diagram" | "json">("diagram");
  const afterChange = useAfterChange();
  const readOnly = !canWrite;

  const api = useMemo<EditorApi>(
    () => ({ doc: ed.doc, readOnly, issues: ed.issues, get: (p) => getAt(ed.doc, p), set: ed.set, partRefs: ed.partRefs, setPartRef: ed.setPartRef }),
    [ed.doc, ed.issues, ed.partRefs, ed.set, ed.setPartRef, readOnly],
  );

  useEffect(() => {
    if (!ed.dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [ed.dirty]);

  async function save(note: string) {
    const rev = await ed.save(note);
    // refreshed after a refusal too: a conflict means the history has grown
    void afterChange({ revalidate: [revisionsKey(option.id), `/api/v1/options/${option.id}`], page: false });
    return rev;
  }

  async function openRevision(revision: number) {
    if (ed.dirty && !window.confirm(`Replace your unsaved edits with revision ${revision}?`)) return;
    try {
      const r = await fetchJson<{ revision: Snapshot }>(`/api/v1/options/${option.id}/revisions/${revision}`);
      ed.loadSnapshot({ revision: r.revision.revision, document: r.revision.document, partRefs: r.revision.partRefs }, false);
      ed.setNotice({ tone: "success", text: `Revision ${revision} is loaded into the editor. Saving makes it the next revision.` });
    } catch (e) {
      ed.setNotice({ tone: "error", text: `Revision ${revision} could not be loaded: ${(e as Error).message}` });
    }
  }

  function goTo(path: string) {
    const target = selectionForPath(path);
    setView("diagram");
    if (target.startsWith("positions") || target === "controller") setSelected(target);
    else document.getElementById(`panel-${target}`)?.scrollIntoView({ behavior: "smooth" });
  }

  function addPosition() {
    const positions = (getAt(ed.doc, "positions") as { id?: string }[]) ?? [];
    const taken = new Set(positions.map((p) => p.id));
    let n = positions.length + 1;
    while (taken.has(`Q${n}`)) n++;
    // a copy of the last position (a coherent set of values to edit), renamed
    ed.set("positions", [...positions, { ...structuredClone(positions[positions.length - 1]), id: `Q${n}`, label: undefined }]);
    setSelected(`positions.${positions.length}`);
  }

  function removePosition(i: number) {
    const positions = (getAt(ed.doc, "positions") as unknown[]) ?? [];
    ed.set("positions", positions.filter((_, j) => j !== i));
    setSelected("controller");
  }

  const issueCount = Object.keys(ed.issues).length;
  return (
    <EditorContext.Provider value={api}>
      <OptionHeader option={option} projectName={projectName} canWrite={canWrite} dirty={ed.dirty} />
      {readOnly && <p className="mb-4 rounded-md bg-slateblue-50 px-4 py-2 text-sm text-slateblue-700">You can view this option; your role does not allow editing it.</p>}
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex min-w-0 flex-col gap-6">
          <Panel
            title="Gate-drive chain"
            description="Select a block to edit it. Values take units as you type them (“47 nC”, “6.8 Ω”)."
            actions={
              <div role="group" aria-label="View" className="flex gap-1">
                <Button size="sm" variant={view === "diagram" ? "primary" : "ghost"} aria-pressed={view === "diagram"} onClick={() => setView("diagram")}>
                  Diagram
                </Button>
                <Button size="sm" variant={view === "json" ? "primary" : "ghost"} aria-pressed={view === "json"} onClick={() => setView("json")}>
                  JSON
                </Button>
              </div>
            }
          >
            {view === "diagram" ? (
              <div className="flex flex-col gap-6">
                <ChainDiagram selected={selected} onSelect={setSelected} />
                {!readOnly && (
                  <div>
                    <Button size="sm" variant="secondary" onClick={addPosition}>
                      Add a switch position
                    </Button>
                  </div>
                )}
                <div className="border-t border-paper-line pt-4">
                  <ElementPanel selected={selected} onRemovePosition={removePosition} />
                </div>
              </div>
            ) : (
              <JsonView key={JSON.stringify(ed.base.revision)} doc={ed.doc} readOnly={readOnly} onApply={(d) => ed.setDoc(d)} />
            )}
          </Panel>
          <OperatingPanels />
        </div>
        <aside className="flex flex-col gap-6">
          {canWrite && (
            <Panel title="Save">
              <SaveBar
                baseRevision={ed.base.revision}
                dirty={ed.dirty}
                issueCount={issueCount}
                saving={ed.saving}
                conflict={ed.conflict}
                notice={ed.notice}
                onSave={save}
                onReapply={ed.reapplyOntoLatest}
                onDiscard={(latest) => ed.loadSnapshot(latest, true)}
              />
            </Panel>
          )}
          {!canWrite && ed.notice && <p className="text-sm text-ink-soft">{ed.notice.text}</p>}
          <Panel title={`Issues (${issueCount})`}>
            <IssueList issues={ed.issues} onGo={goTo} />
          </Panel>
          <Panel title="Revisions">
            <RevisionHistory optionId={option.id} initial={revisions} baseRevision={ed.base.revision} onOpen={openRevision} />
          </Panel>
        </aside>
      </div>
    </EditorContext.Provider>
  );
}
