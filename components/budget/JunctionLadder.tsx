import type { CornerResult } from "@/models/evaluate";
import { MarginBar } from "@/components/ui";
import { junctionRows } from "./shape";

/** Every junction at the corner against its derated limit, tightest first. */
export function JunctionLadder({ corner }: { corner: CornerResult }) {
  const rows = junctionRows(corner);
  return (
    <ol className="flex flex-col gap-3" aria-label={`Junction temperatures at ${corner.label}`}>
      {rows.map((r) => (
        <li key={r.id} data-junction={r.id}>
          <MarginBar
            label={r.label}
            tj={r.tj ?? Number.NaN}
            limit={r.limit}
            tjMax={r.tjMax}
            status={r.status}
            from={corner.ambient}
          />
        </li>
      ))}
    </ol>
  );
}
