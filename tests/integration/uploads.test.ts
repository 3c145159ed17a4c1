/**
 * What comes into Branchline, through the real route handlers, the real PostgreSQL and the fake S3 store over
 * loopback (scripts/s3-fake.ts, started by scripts/services.sh): scenario files, sequencer CSVs and attachments.
 * Every refusal is checked to have stored nothing: no row, no revision, no object in the bucket.
 */
import { ListObjectsV2Command, S3Client, GetObjectCommand } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { NextRequest } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";
import * as attachmentRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/attachments/[attachmentId]/route";
import * as attachmentsRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/attachments/route";
import * as sequencerRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/sequencer-profile/route";
import * as importRoute from "@/app/api/projects/[projectId]/scenarios/import/route";
import { getDb } from "@/db";
import { storageConfig } from "@/lib/storage";
import { scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call, type TestUser } from "./harness";

const config = storageConfig();
const s3 = new S3Client({
  endpoint: config.endpoint,
  region: config.region,
  forcePathStyle: config.forcePathStyle,
  credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
});

async function objectKeysUnder(prefix: string): Promise<string[]> {
  try {
    const list = await s3.send(new ListObjectsV2Command({ Bucket: config.bucket, Prefix: prefix }));
    return (list.Contents ?? []).map((o) => o.Key!);
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchBucket") return [];
    throw error;
  }
}

const scenarioPrefix = (f: ProjectFixture) => `projects/${f.projectId}/scenarios/${f.scenarioId}/`;
const S = (f: ProjectFixture) => ({ projectId: f.projectId, scenarioId: f.scenarioId });
const base = (f: ProjectFixture) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`;

/** A multipart request built by the platform's own FormData, as a browser sends it. */
// Route handlers type their own params; like the harness, this passes whatever the test names.
type Handler = (req: NextRequest, ctx: { params: Promise<any> }) => Promise<Response>;

async function multipart(handler: Handler, path: string, as: TestUser, params: Record<string, string>, form: FormData) {
  const body = new Response(form);
  const req = new NextRequest(new URL(path, "http://localhost:3999"), {
    method: "POST",
    headers: { cookie: as.cookie, "content-type": body.headers.get("content-type")! },
    body: new Uint8Array(await body.arrayBuffer()),
  });
  const res = await handler(req, { params: Promise.resolve(params) });
  return { status: res.status, body: await res.json() };
}

async function rawUpload(f: ProjectFixture, name: string, bytes: Uint8Array | string, contentType = "application/octet-stream") {
  return call(attachmentsRoute.POST, "POST", `${base(f)}/attachments`, {
    as: f.users.editor,
    params: S(f),
    query: { name },
    headers: { "content-type": contentType },
    rawBody: bytes as string,
  });
}

async function attachmentRows(f: ProjectFixture) {
  return getDb().selectFrom("attachments").select(["id", "objectKey"]).where("scenarioId", "=", f.scenarioId).execute();
}

async function scenarioCount(projectId: string) {
  const row = await getDb().selectFrom("scenarios").select((eb) => eb.fn.countAll<string>().as("n")).where("projectId", "=", projectId).executeTakeFirstOrThrow();
  return Number(row.n);
}

async function revisionCount(scenarioId: string) {
  const row = await getDb().selectFrom("scenarioRevisions").select((eb) => eb.fn.countAll<string>().as("n")).where("scenarioId", "=", scenarioId).executeTakeFirstOrThrow();
  return Number(row.n);
}

// The smallest valid PNG: signature, IHDR for 1×1 greyscale, IDAT, IEND (PNG specification, W3C 2003, §5.2–§11).
const PNG_1x1 = Uint8Array.from(
  Buffer.from("89504e470d0a1a0a0000000d49484452000000010000000108000000003a7e9b550000000a49444154789c63600000000200015e2a3f3c0000000049454e44ae426082", "hex"),
);

let f: ProjectFixture;
beforeAll(async () => {
  f = await projectFixture();
});

describe("scenario file import", () => {
  it("creates a new scenario with its first revision, titled from the file", async () => {
    const file = scenarioFileText(toScenarioFile({ title: "Cold-atom pair, 2 µm", document: { ...defaultScenarioDocument(), separation: { axis: "radial", split: "symmetric", distanceMetres: 2e-6 } } }));
    const before = await scenarioCount(f.projectId);
    const res = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, {
      as: f.users.editor,
      params: { projectId: f.projectId },
      headers: { "content-type": "application/json" },
      rawBody: file,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.scenario).toMatchObject({ title: "Cold-atom pair, 2 µm", version: 1 });
    expect(res.body.scenario.document.separation.distanceMetres).toBe(2e-6);
    expect(await scenarioCount(f.projectId)).toBe(before + 1);
    expect(await revisionCount(res.body.scenario.id)).toBe(1);
  });

  it("takes the file as multipart too", async () => {
    const form = new FormData();
    form.set("file", new File([scenarioFileText(toScenarioFile({ title: "From a form", document: defaultScenarioDocument() }))], "pair.json", { type: "application/json" }));
    const res = await multipart(importRoute.POST, `/api/projects/${f.projectId}/scenarios/import`, f.users.owner, { projectId: f.projectId }, form);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.scenario.title).toBe("From a form");
    const history = await getDb().selectFrom("projectAudit").select(["action", "actorId", "subject"]).where("scenarioId", "=", res.body.scenario.id).execute();
    expect(history).toEqual([{ action: "scenario_imported", actorId: f.users.owner.id, subject: "pair.json" }]);
  });

  it("answers 422 with every problem by its path, and stores nothing", async () => {
    const before = await scenarioCount(f.projectId);
    const bad = { format: "branchline-scenario", formatVersion: 1, title: "", document: { ...defaultScenarioDocument(), source: { chargeCoulombs: "lots", massKg: -1 } } };
    const res = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, { as: f.users.editor, params: { projectId: f.projectId }, body: bad });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("unprocessable");
    const paths = res.body.error.fields.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["title", "document.source.chargeCoulombs", "document.source.massKg"]));
    expect(await scenarioCount(f.projectId)).toBe(before);
  });

  it("answers 422 for text that is not JSON, saying where it broke", async () => {
    const res = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, {
      as: f.users.editor,
      params: { projectId: f.projectId },
      headers: { "content-type": "application/json" },
      rawBody: '{ "format": "branchline-scenario", ',
    });
    expect(res.status).toBe(422);
    expect(res.body.error.fields[0].message).toMatch(/not valid JSON/);
  });

  it("answers 413 for a file over 2 MB and 415 for a content type it does not take", async () => {
    const before = await scenarioCount(f.projectId);
    const huge = JSON.stringify({ padding: "x".repeat(2 * 1024 * 1024 + 10) });
    const big = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, { as: f.users.editor, params: { projectId: f.projectId }, headers: { "content-type": "application/json" }, rawBody: huge });
    expect(big.status).toBe(413);
    expect(big.body.error.message).toMatch(/limit is 2\.0 MB/);
    const wrong = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, { as: f.users.editor, params: { projectId: f.projectId }, headers: { "content-type": "image/png" }, rawBody: "x" });
    expect(wrong.status).toBe(415);
    expect(wrong.body.error).toMatchObject({ code: "unsupported_media_type", message: expect.stringContaining("image/png") });
    const empty = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, { as: f.users.editor, params: { projectId: f.projectId }, headers: { "content-type": "application/json" }, rawBody: "" });
    expect(empty.status).toBe(422);
    expect(await scenarioCount(f.projectId)).toBe(before);
  });
});

describe("sequencer profile", () => {
  const good = "t [ms],separation [um]\n0,0\n10,1.5\n20,3\n30,3\n40,0\n";

  it("previews without storing anything (dryRun=1)", async () => {
    const before = await revisionCount(f.scenarioId);
    const res = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, {
      as: f.users.editor,
      params: S(f),
      query: { dryRun: "1" },
      headers: { "content-type": "text/csv" },
      rawBody: good,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.profile).toMatchObject({ rowCount: 5, flags: [] });
    expect(res.body.profile.durationSeconds).toBeCloseTo(0.04, 12);
    expect(res.body.profile.maxSeparationMetres).toBeCloseTo(3e-6, 15);
    expect(res.body.protocol).toMatchObject({ kind: "sampled", interpolation: "linear" });
    expect(await revisionCount(f.scenarioId)).toBe(before);
  });

  it("saves a new revision with the sampled protocol, and answers 409 for a stale version", async () => {
    const current = await getDb().selectFrom("scenarios").select("version").where("id", "=", f.scenarioId).executeTakeFirstOrThrow();
    const form = new FormData();
    form.set("file", new File(["time,separation\n0,0\n1,2\n2,0\n"], "run-17.csv", { type: "text/csv" }));
    form.set("timeUnit", "ms");
    form.set("separationUnit", "um");
    form.set("version", String(current.version));
    const res = await multipart(sequencerRoute.POST, `${base(f)}/sequencer-profile`, f.users.editor, S(f), form);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.scenario.version).toBe(current.version + 1);
    expect(res.body.scenario.document.protocol.kind).toBe("sampled");
    expect(res.body.scenario.document.protocol.samples[1]).toEqual({ timeSeconds: 1e-3, separationMetres: 2e-6 });

    const before = await revisionCount(f.scenarioId);
    const stale = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, {
      as: f.users.editor,
      params: S(f),
      query: { version: String(current.version) },
      headers: { "content-type": "text/csv" },
      rawBody: good,
    });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("version_conflict");
    expect(await revisionCount(f.scenarioId)).toBe(before);
  });

  it("answers 422 listing the bad rows by number, and stores nothing", async () => {
    const before = await revisionCount(f.scenarioId);
    const res = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, {
      as: f.users.editor,
      params: S(f),
      query: { version: "1" },
      headers: { "content-type": "text/csv" },
      rawBody: "t [ms],separation [um]\n0,0\n1,abc\n2,-1\n3,0\n",
    });
    expect(res.status).toBe(422);
    expect(res.body.error.rows).toEqual([
      { row: 3, message: "row 3: separation 'abc' is not a number" },
      { row: 4, message: "row 4: separation -1 um is negative; a separation is 0 or more" },
    ]);
    expect(res.body.error.fields[0]).toEqual({ path: "row 3", message: "row 3: separation 'abc' is not a number" });
    expect(await revisionCount(f.scenarioId)).toBe(before);
  });

  it("says which units are missing when the header has none", async () => {
    const res = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, {
      as: f.users.editor,
      params: S(f),
      query: { dryRun: "1" },
      headers: { "content-type": "text/csv" },
      rawBody: "time,separation\n0,0\n1,1\n2,0\n",
    });
    expect(res.status).toBe(422);
    expect(res.body.error.missingUnits).toEqual(["time", "separation"]);
  });

  it("refuses an empty body (422), a wrong content type (415) and a body over 5 MB (413)", async () => {
    const empty = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, { as: f.users.editor, params: S(f), query: { dryRun: "1" }, headers: { "content-type": "text/csv" }, rawBody: "" });
    expect(empty.status).toBe(422);
    expect(empty.body.error.message).toMatch(/empty/);
    const wrong = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, { as: f.users.editor, params: S(f), query: { dryRun: "1" }, headers: { "content-type": "application/pdf" }, rawBody: "%PDF-1.4" });
    expect(wrong.status).toBe(415);
    const big = await call(sequencerRoute.POST, "POST", `${base(f)}/sequencer-profile`, {
      as: f.users.editor,
      params: S(f),
      query: { dryRun: "1" },
      headers: { "content-type": "text/csv" },
      rawBody: `t [s],d [m]\n${"0,0\n".repeat(1_400_000)}`,
    });
    expect(big.status).toBe(413);
    expect(big.body.error.message).toMatch(/limit is 5\.0 MB/);
  });
});

describe("attachments", () => {
  it("round-trips the bytes through the signed download link", async () => {
    const csv = "t [ms],separation [um]\n0,0\n12.5,2.25\n25,0\n";
    const up = await rawUpload(f, "run-2026-11-30.csv", csv, "text/csv");
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect(up.body.attachment).toMatchObject({ fileName: "run-2026-11-30.csv", mediaType: "text/csv", sizeBytes: csv.length, uploadedBy: { id: f.users.editor.id } });

    const list = await call(attachmentsRoute.GET, "GET", `${base(f)}/attachments`, { as: f.users.viewer, params: S(f) });
    expect(list.body.attachments.map((a: { id: string }) => a.id)).toContain(up.body.attachment.id);

    const link = await call(attachmentRoute.GET, "GET", `${base(f)}/attachments/${up.body.attachment.id}`, { as: f.users.viewer, params: { ...S(f), attachmentId: up.body.attachment.id } });
    expect(link.status).toBe(200);
    const expiresIn = Date.parse(link.body.expiresAt) - Date.now();
    expect(expiresIn).toBeGreaterThan(4 * 60 * 1000);
    expect(expiresIn).toBeLessThanOrEqual(5 * 60 * 1000);
    const download = await fetch(link.body.url);
    expect(download.status).toBe(200);
    expect(await download.text()).toBe(csv);
    expect(download.headers.get("content-disposition")).toMatch(/^attachment;.*run-2026-11-30\.csv/);
    expect(download.headers.get("content-security-policy")).toBe("sandbox");
    expect(download.headers.get("x-content-type-options")).toBe("nosniff");
    // The same object without the presigned query string: refused, as a real store refuses it.
    const bare = await fetch(link.body.url.split("?")[0]);
    expect(bare.status).toBe(403);
    expect(await bare.text()).toContain("<Code>AccessDenied</Code>");

    const redirect = await call(attachmentRoute.GET, "GET", `${base(f)}/attachments/${up.body.attachment.id}`, { as: f.users.viewer, params: { ...S(f), attachmentId: up.body.attachment.id }, query: { redirect: "1" } });
    expect(redirect.status).toBe(303);
    expect(redirect.headers.get("location")).toContain("X-Amz-Signature=");
  });

  it("keeps a PNG sent as multipart byte for byte", async () => {
    const form = new FormData();
    form.set("file", new File([PNG_1x1], "fringe.png", { type: "image/png" }));
    const res = await multipart(attachmentsRoute.POST, `${base(f)}/attachments`, f.users.owner, S(f), form);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.attachment.mediaType).toBe("image/png");
    const link = await call(attachmentRoute.GET, "GET", `${base(f)}/attachments/${res.body.attachment.id}`, { as: f.users.editor, params: { ...S(f), attachmentId: res.body.attachment.id } });
    const bytes = new Uint8Array(await (await fetch(link.body.url)).arrayBuffer());
    expect(Buffer.from(bytes).equals(Buffer.from(PNG_1x1))).toBe(true);
  });

  it("refuses an expired or tampered signed link with 403", async () => {
    const [row] = await attachmentRows(f);
    const command = new GetObjectCommand({ Bucket: config.bucket, Key: row.objectKey });
    const expired = await getSignedUrl(s3, command, { expiresIn: 300, signingDate: new Date(Date.now() - 10 * 60 * 1000) });
    const res = await fetch(expired);
    expect(res.status).toBe(403);
    expect(await res.text()).toContain("<Code>AccessDenied</Code>");
    const fresh = await getSignedUrl(s3, command, { expiresIn: 300 });
    const tampered = await fetch(fresh.replace(/X-Amz-Expires=300/, "X-Amz-Expires=600"));
    expect(tampered.status).toBe(403);
    expect(await tampered.text()).toContain("SignatureDoesNotMatch");
  });

  it("deletes the row and the object", async () => {
    const up = await rawUpload(f, "notes.json", '{"fit": "invented"}', "application/json");
    expect(up.status).toBe(201);
    const key = `${scenarioPrefix(f)}attachments/${up.body.attachment.id}`;
    expect(await objectKeysUnder(key)).toEqual([key]);
    const viewer = await call(attachmentRoute.DELETE, "DELETE", `${base(f)}/attachments/${up.body.attachment.id}`, { as: f.users.viewer, params: { ...S(f), attachmentId: up.body.attachment.id } });
    expect(viewer.status).toBe(403);
    const res = await call(attachmentRoute.DELETE, "DELETE", `${base(f)}/attachments/${up.body.attachment.id}`, { as: f.users.editor, params: { ...S(f), attachmentId: up.body.attachment.id } });
    expect(res.status).toBe(204);
    expect(await objectKeysUnder(key)).toEqual([]);
    expect((await attachmentRows(f)).map((r) => r.id)).not.toContain(up.body.attachment.id);
  });

  it("removes a scenario's objects from the store when the scenario, or its whole project, is deleted", async () => {
    const own = await projectFixture();
    const ownBase = `/api/projects/${own.projectId}/scenarios/${own.scenarioId}`;
    const up = await rawUpload(own, "fit.json", '{"fringe": "invented"}', "application/json");
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect(await objectKeysUnder(scenarioPrefix(own))).toHaveLength(1);
    const scenarioRoute = await import("@/app/api/projects/[projectId]/scenarios/[scenarioId]/route");
    expect((await call(scenarioRoute.DELETE, "DELETE", ownBase, { as: own.users.editor, params: S(own) })).status).toBe(204);
    expect(await objectKeysUnder(scenarioPrefix(own))).toEqual([]);

    const other = await projectFixture();
    const again = await rawUpload(other, "notes.csv", "t [s],separation [m]\n0,0\n1,0\n", "text/csv");
    expect(again.status, JSON.stringify(again.body)).toBe(201);
    const projectRoute = await import("@/app/api/projects/[projectId]/route");
    expect((await call(projectRoute.DELETE, "DELETE", `/api/projects/${other.projectId}`, { as: other.users.owner, params: { projectId: other.projectId } })).status).toBe(204);
    expect(await objectKeysUnder(`projects/${other.projectId}/`)).toEqual([]);
  });

  describe("refusals store nothing", () => {
    const refusals: { name: string; file: string; bytes: () => Uint8Array | string; contentType?: string; status: number; reason: RegExp }[] = [
      { name: "a PDF named .png", file: "figure.png", bytes: () => "%PDF-1.7\n%...", status: 415, reason: /named as a PNG image but its content is a PDF/ },
      { name: "a .json that does not parse", file: "fit.json", bytes: () => "{ not json", status: 415, reason: /not valid JSON/ },
      { name: "an SVG with a script", file: "plot.svg", bytes: () => '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>', status: 415, reason: /<script>/ },
      // The bypasses of the old text filter (issue 13): an entity-encoded javascript: link, an animation that rewrites
      // a link, HTML (an iframe) inside <foreignObject>, and <set> rewriting xlink:href.
      { name: "an SVG with a jav&#x61;script: link", file: "plot.svg", bytes: () => '<svg xmlns="http://www.w3.org/2000/svg"><a href="jav&#x61;script:alert(1)"><text>x</text></a></svg>', status: 415, reason: /unsafe href/ },
      { name: "an SVG with <animate> rewriting href", file: "plot.svg", bytes: () => '<svg xmlns="http://www.w3.org/2000/svg"><a><animate attributeName="href" values="javascript:alert(1)"/><text>x</text></a></svg>', status: 415, reason: /<animate>/ },
      { name: "an SVG with an iframe in <foreignObject>", file: "plot.svg", bytes: () => '<svg xmlns="http://www.w3.org/2000/svg"><foreignObject width="9" height="9"><iframe xmlns="http://www.w3.org/1999/xhtml" src="javascript:alert(1)"></iframe></foreignObject></svg>', status: 415, reason: /<foreignObject>/ },
      { name: "an SVG with <set> rewriting xlink:href", file: "plot.svg", bytes: () => '<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink"><a><set attributeName="xlink:href" to="javascript:alert(1)"/><circle r="4"/></a></svg>', status: 415, reason: /<set>/ },
      { name: "an HTML page named .svg", file: "plot.svg", bytes: () => "<html><body>hi</body></html>", status: 415, reason: /<html> root/ },
      { name: "binary bytes named .csv", file: "run.csv", bytes: () => Uint8Array.from([0x00, 0xff, 0x10, 0x80]), status: 415, reason: /neither a PDF, a PNG nor UTF-8/ },
      { name: "an ending not kept", file: "run.exe", bytes: () => "MZ", status: 415, reason: /not a kind of file Branchline keeps/ },
      { name: "an empty file", file: "empty.csv", bytes: () => "", status: 422, reason: /empty/ },
      { name: "a file over 10 MB", file: "big.csv", bytes: () => "0,0\n".repeat(2_700_000), status: 413, reason: /limit is 10\.0 MB/ },
    ];
    for (const r of refusals) {
      it(`refuses ${r.name} with ${r.status} and the reason`, async () => {
        const rowsBefore = (await attachmentRows(f)).length;
        const objectsBefore = (await objectKeysUnder(scenarioPrefix(f))).length;
        const res = await rawUpload(f, r.file, r.bytes());
        expect(res.status).toBe(r.status);
        expect(res.body.error.message).toMatch(r.reason);
        expect((await attachmentRows(f)).length).toBe(rowsBefore);
        expect((await objectKeysUnder(scenarioPrefix(f))).length).toBe(objectsBefore);
      });
    }
  });

  it("keeps a plotting library's SVG (metadata, <use> links inside the file, an embedded PNG)", async () => {
    const figure =
      '<?xml version="1.0" encoding="utf-8"?>\n<!DOCTYPE svg PUBLIC "-//W3C//DTD SVG 1.1//EN" "http://www.w3.org/Graphics/SVG/1.1/DTD/svg11.dtd">\n' +
      '<svg xmlns:xlink="http://www.w3.org/1999/xlink" width="46pt" height="34pt" viewBox="0 0 46 34" xmlns="http://www.w3.org/2000/svg"><metadata><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"/></metadata>' +
      '<defs><style type="text/css">*{stroke-linejoin: round}</style><path id="tick" d="M 0 0 L 0 3.5"/></defs><use xlink:href="#tick" x="5" y="30"/>' +
      '<image xlink:href="data:image/png;base64,iVBORw0KGgo=" width="3" height="3"/><text x="1" y="9">d = 1 µm</text></svg>';
    const res = await rawUpload(f, "fringes.svg", figure, "image/svg+xml");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it("keeps an SVG figure and a PDF note, typed by their content", async () => {
    const svg = await rawUpload(f, "diagram.svg", '<?xml version="1.0"?>\n<!-- invented figure -->\n<svg xmlns="http://www.w3.org/2000/svg" width="4" height="4"><rect width="4" height="4"/></svg>');
    expect(svg.status, JSON.stringify(svg.body)).toBe(201);
    expect(svg.body.attachment.mediaType).toBe("image/svg+xml");
    const pdf = await rawUpload(f, "notes.pdf", "%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n");
    expect(pdf.status).toBe(201);
    expect(pdf.body.attachment.mediaType).toBe("application/pdf");
  });
});
