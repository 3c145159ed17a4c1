/**
 * The OpenAPI 3.1 description of Branchline's JSON API, generated from the very zod schemas the route handlers
 * enforce (lib/contracts.ts and the scenario schema), by @asteasolutions/zod-to-openapi. One entry per route
 * and method under app/api; a unit test fails when a route has none, or an entry names no route.
 * Pure (zod and the generator only): served at /api/openapi.json and read by the API reference page.
 */
import { extendZodWithOpenApi, OpenAPIRegistry, OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import * as contracts from "../contracts/requests";
import { scenarioDocumentSchema } from "../physics/scenario/schema";

// The generator's documented set-up: it adds .openapi() to zod's types, used here only to name the error shape.
extendZodWithOpenApi(z);

type Method = "get" | "post" | "put" | "patch" | "delete";

/** Who may call an operation, in words (the authorization table in the integration tests is the proof). */
type Access = "anyone" | "signed in" | "project viewer" | "project editor" | "project owner" | "site administrator" | "share link";

interface Operation {
  method: Method;
  path: string;
  tag: string;
  summary: string;
  access: Access;
  body?: { schema: z.ZodType; mediaTypes?: string[]; description?: string };
  query?: z.ZodObject;
  success: { status: 200 | 201 | 202 | 204; description: string; mediaType?: string };
}

const json = "application/json";

const errorSchema = z.object({
  error: z.object({
    code: z.string().describe("a stable machine-readable code, e.g. validation_failed, not_found, version_conflict"),
    message: z.string().describe("what went wrong, in words"),
    fields: z.array(z.object({ path: z.string().describe("the document path of the problem, e.g. document.separation.distanceMetres"), message: z.string() })).optional(),
  }),
});

const scenarioFileSchema = z.object({
  format: z.literal("branchline-scenario"),
  title: z.string(),
  document: scenarioDocumentSchema,
}).describe("A scenario file as the editor exports it (see docs/formats.md)");

/** Every route and method under app/api (next-auth's own handler at /api/auth/* is left to next-auth). */
export const operations: Operation[] = [
  { method: "post", path: "/api/compute", tag: "Compute", summary: "Compute the decoherence budget of a scenario document", access: "anyone", body: { schema: scenarioDocumentSchema }, success: { status: 200, description: "The result (resultVersion 1): every channel's quanta, rates, decoherence and flags" } },

  { method: "post", path: "/api/users", tag: "Account", summary: "Create an account", access: "anyone", body: { schema: contracts.signUpSchema }, success: { status: 201, description: "Signed up (the same answer whether or not the address already has an account; its owner is e-mailed instead)" } },
  { method: "get", path: "/api/account", tag: "Account", summary: "The signed-in account", access: "signed in", success: { status: 200, description: "The account" } },
  { method: "patch", path: "/api/account", tag: "Account", summary: "Change the account's name", access: "signed in", body: { schema: contracts.accountUpdateSchema }, success: { status: 200, description: "The account" } },
  { method: "delete", path: "/api/account/sessions", tag: "Account", summary: "Sign out everywhere: end every session of the account, this one included", access: "signed in", success: { status: 204, description: "Every session ended" } },
  { method: "post", path: "/api/password-reset", tag: "Account", summary: "Send a password-reset link by e-mail", access: "anyone", body: { schema: contracts.passwordResetRequestSchema }, success: { status: 202, description: "Accepted (the same answer whether or not the address has an account)" } },
  { method: "post", path: "/api/password-reset/confirm", tag: "Account", summary: "Set a new password with a reset token", access: "anyone", body: { schema: contracts.passwordResetConfirmSchema }, success: { status: 200, description: "The password is changed" } },

  { method: "get", path: "/api/admin/users", tag: "Administration", summary: "List every account", access: "site administrator", success: { status: 200, description: "The accounts" } },
  { method: "patch", path: "/api/admin/users/{userId}", tag: "Administration", summary: "Change an account's site role", access: "site administrator", body: { schema: contracts.siteRoleUpdateSchema }, success: { status: 200, description: "The account" } },

  { method: "get", path: "/api/projects", tag: "Projects", summary: "The projects the caller belongs to", access: "signed in", success: { status: 200, description: "The projects, with the caller's role and rights in each" } },
  { method: "post", path: "/api/projects", tag: "Projects", summary: "Create a project (the caller becomes its owner)", access: "signed in", body: { schema: contracts.projectCreateSchema }, success: { status: 201, description: "The project" } },
  { method: "get", path: "/api/projects/{projectId}", tag: "Projects", summary: "One project", access: "project viewer", success: { status: 200, description: "The project" } },
  { method: "patch", path: "/api/projects/{projectId}", tag: "Projects", summary: "Rename a project or change its description", access: "project owner", body: { schema: contracts.projectUpdateSchema }, success: { status: 200, description: "The project" } },
  { method: "delete", path: "/api/projects/{projectId}", tag: "Projects", summary: "Delete a project with its scenarios and files", access: "project owner", success: { status: 204, description: "Deleted" } },
  { method: "post", path: "/api/projects/{projectId}/ownership", tag: "Projects", summary: "Make another member the owner", access: "project owner", body: { schema: contracts.ownershipTransferSchema }, success: { status: 200, description: "The project's members after the change" } },
  { method: "get", path: "/api/projects/{projectId}/audit", tag: "Projects", summary: "The project's log of changes to members, invitations and links", access: "project owner", success: { status: 200, description: "The log, newest first" } },

  { method: "get", path: "/api/projects/{projectId}/members", tag: "Members", summary: "The project's members", access: "project viewer", success: { status: 200, description: "The members" } },
  { method: "post", path: "/api/projects/{projectId}/members", tag: "Members", summary: "Add an existing account as a member", access: "project owner", body: { schema: contracts.memberAddSchema }, success: { status: 201, description: "The member" } },
  { method: "patch", path: "/api/projects/{projectId}/members/{userId}", tag: "Members", summary: "Change a member's role", access: "project owner", body: { schema: contracts.memberUpdateSchema }, success: { status: 200, description: "The member" } },
  { method: "delete", path: "/api/projects/{projectId}/members/{userId}", tag: "Members", summary: "Remove a member (or leave the project oneself)", access: "project viewer", success: { status: 204, description: "Removed" } },
  { method: "get", path: "/api/projects/{projectId}/invitations", tag: "Members", summary: "Open invitations", access: "project owner", success: { status: 200, description: "The invitations" } },
  { method: "post", path: "/api/projects/{projectId}/invitations", tag: "Members", summary: "Invite an address by e-mail", access: "project owner", body: { schema: contracts.invitationCreateSchema }, success: { status: 201, description: "The invitation (its link goes out by e-mail only)" } },
  { method: "delete", path: "/api/projects/{projectId}/invitations/{invitationId}", tag: "Members", summary: "Revoke an invitation", access: "project owner", success: { status: 204, description: "Revoked" } },
  { method: "post", path: "/api/projects/{projectId}/invitations/{invitationId}/resend", tag: "Members", summary: "Send an invitation again with a fresh link", access: "project owner", success: { status: 200, description: "The invitation" } },
  { method: "post", path: "/api/invitations/{token}/accept", tag: "Members", summary: "Accept an invitation sent to the caller's address", access: "signed in", success: { status: 200, description: "The project joined" } },

  { method: "get", path: "/api/projects/{projectId}/scenarios", tag: "Scenarios", summary: "A page of the project's scenarios, sorted and filtered", access: "project viewer", query: contracts.scenarioListQuerySchema, success: { status: 200, description: "The page and the total count" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios", tag: "Scenarios", summary: "Create a scenario", access: "project editor", body: { schema: contracts.scenarioCreateSchema.extend({ document: scenarioDocumentSchema.optional() }) }, success: { status: 201, description: "The scenario at version 1" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/import", tag: "Scenarios", summary: "Import a scenario file", access: "project editor", body: { schema: scenarioFileSchema, mediaTypes: [json, "text/plain"] }, success: { status: 201, description: "The new scenario" } },
  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}", tag: "Scenarios", summary: "One scenario with its document (upgraded to the current schema version)", access: "project viewer", success: { status: 200, description: "The scenario" } },
  { method: "put", path: "/api/projects/{projectId}/scenarios/{scenarioId}", tag: "Scenarios", summary: "Save a scenario with the version it was edited from", access: "project editor", body: { schema: contracts.scenarioUpdateSchema.extend({ document: scenarioDocumentSchema.optional() }), description: "A stale version answers 409 with the version now stored; a change of `display` alone amends the caller's own latest version" }, success: { status: 200, description: "The scenario at its new version" } },
  { method: "delete", path: "/api/projects/{projectId}/scenarios/{scenarioId}", tag: "Scenarios", summary: "Delete a scenario with its files", access: "project editor", success: { status: 204, description: "Deleted" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/{scenarioId}/duplicate", tag: "Scenarios", summary: "Copy a scenario", access: "project editor", body: { schema: contracts.scenarioDuplicateSchema }, success: { status: 201, description: "The copy at version 1" } },
  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/export", tag: "Scenarios", summary: "Download the scenario file or the Budget as CSV", access: "project viewer", query: contracts.exportQuerySchema, success: { status: 200, description: "The file, as an attachment", mediaType: "application/octet-stream" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/{scenarioId}/sequencer-profile", tag: "Scenarios", summary: "Read a sequencer's CSV into a sampled protocol (preview with dryRun, or save)", access: "project editor", body: { schema: contracts.sequencerProfileJsonSchema, mediaTypes: [json, "text/csv"], description: "JSON { csv, settings }, or the CSV itself as text/csv with the settings in the query" }, success: { status: 200, description: "The profile read, and the scenario when saved" } },

  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/revisions", tag: "History", summary: "Every saved version of a scenario", access: "project viewer", success: { status: 200, description: "The versions, newest first" } },
  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/revisions/{version}", tag: "History", summary: "One saved version with its document", access: "project viewer", success: { status: 200, description: "The version" } },
  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/revisions/{version}/diff", tag: "History", summary: "What changed between two versions", access: "project viewer", query: contracts.revisionDiffQuerySchema, success: { status: 200, description: "The changes, as document paths with values before and after" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/{scenarioId}/revisions/{version}/restore", tag: "History", summary: "Save an old version again as the newest", access: "project editor", success: { status: 201, description: "The scenario at its new version" } },

  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/attachments", tag: "Files", summary: "The scenario's attached files", access: "project viewer", success: { status: 200, description: "The files" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/{scenarioId}/attachments", tag: "Files", summary: "Attach a file", access: "project editor", body: { schema: z.string().describe("the file's bytes"), mediaTypes: ["application/octet-stream", "multipart/form-data"] }, success: { status: 201, description: "The file" } },
  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/attachments/{attachmentId}", tag: "Files", summary: "A five-minute download link to a file", access: "project viewer", success: { status: 200, description: "The link and when it expires" } },
  { method: "delete", path: "/api/projects/{projectId}/scenarios/{scenarioId}/attachments/{attachmentId}", tag: "Files", summary: "Delete a file", access: "project editor", success: { status: 204, description: "Deleted" } },

  { method: "get", path: "/api/projects/{projectId}/scenarios/{scenarioId}/share-links", tag: "Sharing", summary: "The scenario's share links", access: "project owner", success: { status: 200, description: "The links" } },
  { method: "post", path: "/api/projects/{projectId}/scenarios/{scenarioId}/share-links", tag: "Sharing", summary: "Make a read-only share link", access: "project owner", body: { schema: contracts.shareLinkCreateSchema }, success: { status: 201, description: "The link and its URL (shown once)" } },
  { method: "delete", path: "/api/projects/{projectId}/scenarios/{scenarioId}/share-links/{linkId}", tag: "Sharing", summary: "Revoke a share link", access: "project owner", success: { status: 204, description: "Revoked" } },
  { method: "get", path: "/api/share/{token}", tag: "Sharing", summary: "A shared scenario and its computed result", access: "share link", success: { status: 200, description: "The scenario, read-only, with its result" } },
  { method: "get", path: "/api/share/{token}/export", tag: "Sharing", summary: "Download a shared scenario's file or Budget", access: "share link", query: contracts.exportQuerySchema, success: { status: 200, description: "The file, as an attachment", mediaType: "application/octet-stream" } },

  { method: "get", path: "/api/openapi.json", tag: "Reference", summary: "This description of the API", access: "anyone", success: { status: 200, description: "The OpenAPI 3.1 document" } },
];

const pathParameters = (path: string) => {
  const names = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
  return names.length === 0 ? undefined : z.object(Object.fromEntries(names.map((name) => [name, z.string()])));
};

/** The OpenAPI 3.1 document, built anew from the schemas. */
export function openApiDocument() {
  const registry = new OpenAPIRegistry();
  const error = registry.register("Error", errorSchema);
  registry.registerComponent("securitySchemes", "session", { type: "apiKey", in: "cookie", name: "next-auth.session-token", description: "The browser session after signing in" });
  for (const op of operations) {
    const body = op.body && {
      description: op.body.description,
      content: Object.fromEntries((op.body.mediaTypes ?? [json]).map((mediaType) => [mediaType, { schema: mediaType === json ? op.body!.schema : z.string() }])),
    };
    registry.registerPath({
      method: op.method,
      path: op.path,
      tags: [op.tag],
      summary: op.summary,
      description: `Who may call it: ${op.access}.`,
      security: op.access === "anyone" || op.access === "share link" ? [] : [{ session: [] }],
      request: { params: pathParameters(op.path), query: op.query, body },
      responses: {
        [op.success.status]: {
          description: op.success.description,
          ...(op.success.status === 204 ? {} : { content: { [op.success.mediaType ?? json]: { schema: z.unknown() } } }),
        },
        "4XX": { description: "The request was refused: bad input (400, with each field's path), signed out (401), not allowed (403), not found or not visible (404), a stale version (409), too large (413), not computable (422), too many requests (429)", content: { [json]: { schema: error } } },
      },
    });
  }
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: {
      title: "Branchline API",
      version: "1",
      description: "Scenarios, projects and the decoherence budget of a superposed body, as JSON over HTTP. SI units throughout; every computed number is { value, log10, unit, sourceKey }.",
    },
    servers: [{ url: "/" }],
  });
}
