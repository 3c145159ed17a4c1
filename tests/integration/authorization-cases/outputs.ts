/** Authorization rows for what leaves Branchline: exports, embeds. */
import { type Case, everyone, holderToo, readers, S } from "./shared";

const sharedExportPath = (token: string) => `/api/share/${token}/export`;

export const outputCases: Case[] = [
  { file: "projects/[projectId]/scenarios/[scenarioId]/export/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/export`, params: S, query: () => ({ what: "scenario" }), expected: holderToo(readers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/export/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/export`, params: S, query: () => ({ what: "budget" }), expected: holderToo(readers(200)) },
  {
    file: "share/[token]/export/route.ts",
    method: "GET",
    extras: true,
    path: (_f, x, caller) => sharedExportPath(caller === "linkHolder" ? x.linkToken : x.revokedLinkToken),
    params: (_f, x, caller) => ({ token: caller === "linkHolder" ? x.linkToken : x.revokedLinkToken }),
    query: () => ({ what: "budget" }),
    expected: { ...everyone(404), linkHolder: 200 },
  },
];
