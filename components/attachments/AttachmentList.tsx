"use client";

import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { type AttachmentDto, useAttachments, useDeleteAttachment } from "@/components/api/uploads";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { EmptyState } from "@/components/ui/EmptyState";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, linkStyles, tableStyles } from "@/components/ui/styles";
import { fileSize } from "@/contracts/requests";
import { kindName } from "./kindName";
import { apiPaths } from "@/contracts/api-paths";

const columns = [
  { label: "File" },
  { label: "Type" },
  { label: "Size", className: "text-right" },
  { label: "Added by" },
  { label: "When" },
  { label: "Actions", hiddenLabel: true },
];

/** The scenario's files: download for everyone who can read it, delete for editors and owners. */
export function AttachmentList({ projectId, scenarioId, canDelete }: { projectId: string; scenarioId: string; canDelete: boolean }) {
  const attachments = useAttachments(projectId, scenarioId);
  const remove = useDeleteAttachment(projectId, scenarioId);
  const [doomed, setDoomed] = useState<AttachmentDto | null>(null);
  const href = (a: AttachmentDto) => `${apiPaths.attachment(projectId, scenarioId, a.id)}?redirect=1`;

  return (
    <>
      <QueryView query={attachments} what="the files" lines={3}>
        {({ attachments: items }) =>
          items.length === 0 ? (
            <EmptyState title="No files yet">{canDelete ? "Figures, notes and data kept here travel with the scenario." : "Editors and owners add files here."}</EmptyState>
          ) : (
            <table className={tableStyles.table}>
              <caption className="sr-only">Files kept with this scenario</caption>
              <TableHead columns={columns} />
              <tbody>
                {items.map((a) => (
                  <tr key={a.id} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} font-semibold break-all`}>
                      <a href={href(a)} className={linkStyles} download={a.fileName} aria-label={`Download ${a.fileName}`}>
                        {a.fileName}
                      </a>
                    </td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{kindName(a.mediaType)}</td>
                    <td className={`${tableStyles.cell} tabular text-right font-mono`} title={`${a.sizeBytes.toLocaleString("en")} bytes`}>
                      {fileSize(a.sizeBytes)}
                    </td>
                    <td className={tableStyles.cell}>{a.uploadedBy?.name ?? <span className="text-ink-faint">a former member</span>}</td>
                    <td className={tableStyles.cell}>
                      <TimeStamp iso={a.createdAt} />
                    </td>
                    <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                      <a href={href(a)} download={a.fileName} className={buttonStyles.row}>
                        Download
                      </a>
                      {canDelete && (
                        <button type="button" className={buttonStyles.row} onClick={() => setDoomed(a)} aria-label={`Delete ${a.fileName}`}>
                          Delete
                        </button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )
        }
      </QueryView>
      <ConfirmDialog
        open={doomed !== null}
        title={`Delete “${doomed?.fileName}”?`}
        confirmLabel="Delete the file"
        pending={remove.isPending}
        error={remove.isError ? messageOf(remove.error) : null}
        onCancel={() => {
          setDoomed(null);
          remove.reset();
        }}
        onConfirm={() => doomed && remove.mutate(doomed.id, { onSuccess: () => setDoomed(null) })}
      >
        The file is removed from the scenario and from storage for everyone in the project. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
