import type { RevisionSummaryDto } from "@/components/api/scenarios";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { tableStyles } from "@/components/ui/styles";

/** The columns every revision table starts with; tables add their own after them. */
export const revisionColumns = [{ label: "Version", className: "text-right" }, { label: "Title then" }, { label: "Saved by" }, { label: "When" }];

/** The cells under revisionColumns: the version (marked when it is the current one), its title, who saved it and when. */
export function RevisionCells({ revision, currentVersion }: { revision: RevisionSummaryDto; currentVersion: number }) {
  return (
    <>
      <td className={`${tableStyles.cell} tabular text-right`}>
        v{revision.version}
        {revision.version === currentVersion && <span className="ml-2 font-sans text-xs text-ink-faint">current</span>}
      </td>
      <td className={tableStyles.cell}>{revision.title}</td>
      <td className={`${tableStyles.cell} text-ink-soft`}>{revision.createdBy?.name ?? "—"}</td>
      <td className={tableStyles.cell}>
        <TimeStamp iso={revision.createdAt} layout="inline" />
      </td>
    </>
  );
}
