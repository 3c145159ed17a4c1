import { getDb } from "@/db";
import { attachmentDownload, deleteAttachment } from "@/db/attachments";
import { json, noContent, requireActor, route } from "@/lib/http";
import { objectStore } from "@/lib/storage";

type Params = { projectId: string; scenarioId: string; attachmentId: string };

/**
 * A signed link to download the file, good for five minutes (readers): { attachment, url, expiresAt }. With
 * ?redirect=1 the answer is a 303 to that link instead, for a plain <a href>.
 */
export const GET = route<Params>(async (req, { projectId, scenarioId, attachmentId }) => {
  const actor = await requireActor(req);
  const download = await attachmentDownload(getDb(), objectStore(), actor, projectId, scenarioId, attachmentId);
  if (req.nextUrl.searchParams.get("redirect") === "1") {
    return new Response(null, { status: 303, headers: { location: download.url, "cache-control": "no-store" } });
  }
  return json(download);
});

/** Removes the file and its stored bytes (editors and owners). */
export const DELETE = route<Params>(async (req, { projectId, scenarioId, attachmentId }) => {
  const actor = await requireActor(req);
  await deleteAttachment(getDb(), objectStore(), actor, projectId, scenarioId, attachmentId);
  return noContent();
});
