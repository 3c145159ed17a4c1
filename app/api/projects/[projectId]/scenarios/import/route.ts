import { getDb } from "@/db";
import { assertMayWriteScenarios } from "@/db/attachments";
import { AppError } from "@/db/errors";
import { createScenario } from "@/db/scenarios";
import { SCENARIO_FILE_MAX_BYTES } from "@/contracts/requests";
import { json, requireActor, route } from "@/lib/http";
import { readUpload, utf8 } from "@/lib/upload-body";
import { parseScenarioFileText } from "@/physics/scenario/exchange";

type Params = { projectId: string };

/**
 * Creates a scenario from a scenario file (editors and owners): the file as the JSON body, or multipart with a
 * `file` field. A file that is not a scenario file answers 422 with every problem by its path in the file.
 */
export const POST = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  await assertMayWriteScenarios(getDb(), actor, projectId);
  const upload = await readUpload(req, { maxBytes: SCENARIO_FILE_MAX_BYTES, what: "the scenario file", accept: ["application/json", "text/plain"] });
  const parsed = parseScenarioFileText(utf8(upload.bytes, "the scenario file").replace(/^\uFEFF/, ""));
  if (!parsed.ok) {
    throw new AppError(
      "unprocessable",
      `this is not a scenario file Branchline can read: ${parsed.issues.length === 1 ? "1 problem" : `${parsed.issues.length} problems`}`,
      parsed.issues.map((i) => ({ path: i.path || "(file)", message: i.message })),
    );
  }
  const scenario = await createScenario(getDb(), actor, projectId, { title: parsed.title, document: parsed.document, importedFrom: upload.name ?? parsed.title });
  return json({ scenario }, 201);
});
