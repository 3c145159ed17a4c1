/** Authorization rows for what comes in: scenario imports, sequencer profiles, attachments. */
import { toScenarioFile } from "@/physics/scenario/exchange";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { type Case, holderToo, P, readers, S, writers } from "./shared";

const A = (f: Parameters<typeof S>[0], x: { attachmentId?: string }) => ({ ...S(f), attachmentId: x.attachmentId! });
const scenarios = (f: Parameters<typeof S>[0]) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`;
const sequencerCsv = "t [ms],separation [um]\n0,0\n10,2\n20,2\n30,0\n";

export const uploadCases: Case[] = [
  {
    file: "projects/[projectId]/scenarios/import/route.ts",
    method: "POST",
    path: (f) => `/api/projects/${f.projectId}/scenarios/import`,
    params: P,
    body: () => toScenarioFile({ title: "Imported pair", document: defaultScenarioDocument() }),
    expected: writers(201),
  },
  {
    // As JSON so that the table's one body shape carries it; text/csv and multipart are in uploads.test.ts.
    file: "projects/[projectId]/scenarios/[scenarioId]/sequencer-profile/route.ts",
    method: "POST",
    path: (f) => `${scenarios(f)}/sequencer-profile`,
    params: S,
    body: () => ({ csv: sequencerCsv, version: 1 }),
    expected: holderToo(writers(200)),
  },
  {
    file: "projects/[projectId]/scenarios/[scenarioId]/attachments/route.ts",
    method: "GET",
    path: (f) => `${scenarios(f)}/attachments`,
    params: S,
    expected: holderToo(readers(200)),
  },
  {
    // A JSON body is the file itself here (raw upload, its name in ?name=).
    file: "projects/[projectId]/scenarios/[scenarioId]/attachments/route.ts",
    method: "POST",
    path: (f) => `${scenarios(f)}/attachments`,
    params: S,
    query: () => ({ name: "fit-parameters.json" }),
    body: () => ({ holdSeconds: 0.25, note: "invented fit for the table" }),
    expected: holderToo(writers(201)),
  },
  {
    file: "projects/[projectId]/scenarios/[scenarioId]/attachments/[attachmentId]/route.ts",
    method: "GET",
    extras: true,
    path: (f, x) => `${scenarios(f)}/attachments/${x.attachmentId}`,
    params: A,
    expected: holderToo(readers(200)),
  },
  {
    file: "projects/[projectId]/scenarios/[scenarioId]/attachments/[attachmentId]/route.ts",
    method: "DELETE",
    extras: true,
    path: (f, x) => `${scenarios(f)}/attachments/${x.attachmentId}`,
    params: A,
    expected: holderToo(writers(204)),
  },
];
