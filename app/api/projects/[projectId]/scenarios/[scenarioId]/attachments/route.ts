import { getDb } from "@/db";
import { assertMayWriteScenarios, listAttachments, uploadAttachment } from "@/db/attachments";
import { AppError } from "@/db/errors";
import { ATTACHMENT_MAX_BYTES } from "@/contracts/requests";
import { json, requireActor, route } from "@/lib/http";
import { classifyAttachment } from "@/lib/sniff";
import { svgVerdict } from "@/lib/svg-safety";
import { objectStore } from "@/lib/storage";
import { readUpload, unsupportedMediaType } from "@/lib/upload-body";

type Params = { projectId: string; scenarioId: string };

/** The scenario's files, newest first (readers). */
export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  return json({ attachments: await listAttachments(getDb(), actor, projectId, scenarioId), maxBytes: ATTACHMENT_MAX_BYTES });
});

/**
 * Keeps a file with the scenario (editors and owners): multipart with a `file` field, or the raw bytes with the
 * file's name in `?name=`. What it is is decided from its content; a name that says otherwise is 415.
 */
export const POST = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  await assertMayWriteScenarios(getDb(), actor, projectId, scenarioId);
  const upload = await readUpload(req, { maxBytes: ATTACHMENT_MAX_BYTES, what: "the file", accept: ["*"] });
  if (!upload.name) throw new AppError("bad_request", "give the file's name (the multipart file name, or ?name=)", [{ path: "name", message: "the file needs a name" }]);
  const kind = classifyAttachment(upload.name, upload.bytes);
  if (!kind.ok) throw unsupportedMediaType(kind.reason);
  if (kind.kind === "svg") {
    const verdict = svgVerdict(new TextDecoder().decode(upload.bytes));
    if (!verdict.ok) throw unsupportedMediaType(verdict.reason);
  }
  const attachment = await uploadAttachment(getDb(), objectStore(), actor, projectId, scenarioId, { fileName: upload.name, mediaType: kind.mediaType, bytes: upload.bytes });
  return json({ attachment }, 201);
});
