/**
 * The OpenAPI description of `/api/v1`, served at `/api/v1/openapi.json` and shown at
 * `/api-reference`. Every route is one entry of `OPERATIONS`, with the permission its handler asks
 * for; bodies and queries are the zod schemas the handlers and services validate with
 * (`z.toJSONSchema`), so the description cannot drift from what is checked.
 * tests/integration/openapi.test.ts fails when a route file has a method that is not here, or the
 * other way round, or when the permission named here is not the one the handler checks.
 */
import { z } from "zod";
import { attendeeSchema, completeBriefingSchema, startBriefingSchema, assignmentSchema } from "./briefing/schemas";
import { jobSchema } from "./jobs/schemas";
import { componentSchema } from "./load-register/schemas";
import { componentListQuerySchema } from "./load-register/queries";
import { approveSchema, returnSchema } from "./revisions/approval";
import { assessmentListQuerySchema } from "./revisions/queries";
import {
  createAssessmentSchema,
  saveRevisionSchema,
  submitRevisionSchema,
  taskBodySchema,
  versionBodySchema,
} from "./revisions/schemas";
import { scoreRequestSchema } from "./rules/request";
import { pageQuerySchema } from "@/lib/pagination";
import type { Action } from "@/lib/permissions";

type Method = "get" | "post" | "put" | "delete";

export interface Operation {
  path: string;
  method: Method;
  summary: string;
  /** The permission the handler checks; "public" needs no caller; "signed-in" applies its own per-record rule. */
  permission: Action | "public" | "signed-in";
  query?: z.ZodObject;
  body?: { json: z.ZodType } | { multipart: Record<string, "file" | "text" | "uuid">; required: string[] } | "csv";
  /** Status → description; a JSON body unless `produces` says otherwise. */
  responses: Record<string, string>;
  produces?: string;
}

const id = "{id}";

export const OPERATIONS: Operation[] = [
  {
    path: "/me",
    method: "get",
    summary: "Who is calling: the user (or the token's creator) and their permissions",
    permission: "profile:read",
    responses: { "200": "The caller" },
  },
  {
    path: "/openapi.json",
    method: "get",
    summary: "This description",
    permission: "public",
    responses: { "200": "OpenAPI 3.1 document" },
  },
  {
    path: "/score",
    method: "post",
    summary: "Score one request or an array of them with the rules engine",
    permission: "score:use",
    body: { json: scoreRequestSchema },
    responses: { "200": "Result(s), in order" },
  },
  {
    path: "/jobs",
    method: "get",
    summary: "List jobs",
    permission: "jobs:read",
    query: pageQuerySchema,
    responses: { "200": "A page of jobs" },
  },
  {
    path: "/jobs",
    method: "post",
    summary: "Create a job",
    permission: "jobs:write",
    body: { json: jobSchema },
    responses: { "201": "The job" },
  },
  { path: `/jobs/${id}`, method: "get", summary: "A job", permission: "jobs:read", responses: { "200": "The job" } },
  {
    path: `/jobs/${id}`,
    method: "put",
    summary: "Update a job",
    permission: "jobs:write",
    body: { json: jobSchema },
    responses: { "200": "The job" },
  },
  {
    path: `/jobs/${id}/foremen`,
    method: "get",
    summary: "The foremen assigned to a job, and those who could be",
    permission: "jobs:write",
    responses: { "200": "Assigned and available foremen" },
  },
  {
    path: `/jobs/${id}/foremen`,
    method: "put",
    summary: "Set the foremen assigned to a job",
    permission: "jobs:write",
    body: { json: assignmentSchema },
    responses: { "200": "Assigned" },
  },
  {
    path: "/components",
    method: "get",
    summary: "List the load register",
    permission: "components:read",
    query: componentListQuerySchema,
    responses: { "200": "A page of components" },
  },
  {
    path: "/components",
    method: "post",
    summary: "Add a component",
    permission: "components:write",
    body: { json: componentSchema },
    responses: { "201": "The component" },
  },
  {
    path: `/components/${id}`,
    method: "get",
    summary: "A component with its attachments",
    permission: "components:read",
    responses: { "200": "The component" },
  },
  {
    path: `/components/${id}`,
    method: "put",
    summary: "Update a component",
    permission: "components:write",
    body: { json: componentSchema },
    responses: { "200": "The component" },
  },
  {
    path: `/components/${id}/attachments`,
    method: "post",
    summary: "Attach a PDF data sheet or a photograph (type checked by content, at most 10 MB)",
    permission: "components:write",
    body: { multipart: { file: "file" }, required: ["file"] },
    responses: { "201": "The attachment" },
  },
  {
    path: "/components/import",
    method: "post",
    summary: "Import components from CSV, all or nothing (?dryRun=1 previews each row's errors)",
    permission: "components:write",
    query: z.object({ dryRun: z.literal("1").optional() }),
    body: "csv",
    responses: { "200": "Preview", "201": "Imported" },
  },
  {
    path: "/components/import/template",
    method: "get",
    summary: "The CSV template",
    permission: "components:write",
    responses: { "200": "The template" },
    produces: "text/csv",
  },
  {
    path: `/attachments/${id}`,
    method: "get",
    summary: "Download an attachment",
    permission: "components:read",
    responses: { "200": "The file" },
    produces: "application/octet-stream",
  },
  {
    path: `/attachments/${id}`,
    method: "delete",
    summary: "Remove an attachment",
    permission: "components:write",
    responses: { "204": "Removed" },
  },
  {
    path: "/assessments",
    method: "get",
    summary: "List assessments (the latest revision of each)",
    permission: "assessments:read",
    query: assessmentListQuerySchema,
    responses: { "200": "A page of assessments" },
  },
  {
    path: "/assessments",
    method: "post",
    summary: "Create an assessment, blank or from a template",
    permission: "assessments:write",
    body: { json: createAssessmentSchema },
    responses: { "201": "Ids of the assessment and its draft" },
  },
  {
    path: `/revisions/${id}`,
    method: "get",
    summary: "A revision with its content and stored results",
    permission: "assessments:read",
    responses: { "200": "The revision" },
  },
  {
    path: `/revisions/${id}`,
    method: "put",
    summary: "Save a draft (409 when the version is stale or the revision locked)",
    permission: "assessments:write",
    body: { json: saveRevisionSchema },
    responses: { "200": "The new version", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/tasks`,
    method: "get",
    summary: "The draft's tasks with their scores",
    permission: "assessments:read",
    responses: { "200": "Tasks" },
  },
  {
    path: `/revisions/${id}/tasks`,
    method: "post",
    summary: "Add a task",
    permission: "assessments:write",
    body: { json: taskBodySchema },
    responses: { "201": "The new version", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/tasks/{taskId}`,
    method: "put",
    summary: "Replace a task",
    permission: "assessments:write",
    body: { json: taskBodySchema },
    responses: { "200": "The new version", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/tasks/{taskId}`,
    method: "delete",
    summary: "Remove a task",
    permission: "assessments:write",
    body: { json: versionBodySchema },
    responses: { "200": "The new version" },
  },
  {
    path: `/revisions/${id}/submit`,
    method: "post",
    summary: "Submit a complete draft to an approver",
    permission: "assessments:submit",
    body: { json: submitRevisionSchema },
    responses: { "200": "Submitted", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/approve`,
    method: "post",
    summary:
      "Countersign: the approver's drawn signature, password (and second-factor code) and the content hash they read",
    permission: "reviews:decide",
    body: { json: approveSchema },
    responses: {
      "200": "Approved; the signed pack is issued",
      "409": "Conflict: changed, or not the content read",
      "429": "Too many wrong passwords or codes",
    },
  },
  {
    path: `/revisions/${id}/return`,
    method: "post",
    summary: "Return to the author with comments per section",
    permission: "reviews:decide",
    body: { json: returnSchema },
    responses: { "200": "Returned as a draft", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/new-revision`,
    method: "post",
    summary: "Start a new draft revision from an approved one",
    permission: "assessments:write",
    responses: { "201": "The new revision's id", "409": "Conflict" },
  },
  {
    path: `/revisions/${id}/pack`,
    method: "get",
    summary:
      "The pack PDF (signed once approved): the author's organisation, the named approver, or an assigned foreman",
    permission: "signed-in",
    responses: { "200": "The PDF" },
    produces: "application/pdf",
  },
  {
    path: `/revisions/${id}/briefing-sheet`,
    method: "get",
    summary: "The briefing sheet PDF; ?briefing=ID adds that briefing's record",
    permission: "briefings:run",
    query: z.object({ briefing: z.uuid().optional() }),
    responses: { "200": "The PDF" },
    produces: "application/pdf",
  },
  {
    path: `/revisions/${id}/briefing-sheet/email`,
    method: "post",
    summary: "E-mail the briefing sheet to the caller",
    permission: "briefings:run",
    responses: { "200": "Sent, or why not" },
  },
  {
    path: "/hazard-library",
    method: "get",
    summary: "The organisation's hazard library, for copying hazards and their controls into an assessment",
    permission: "hazard-library:read",
    responses: { "200": "Every entry, by hazard" },
  },
  {
    path: "/briefings/briefable",
    method: "get",
    summary: "The approved revisions the caller can brief from: what a foreman's phone keeps a copy of",
    permission: "briefings:run",
    responses: { "200": "The revisions, with the time they were checked" },
  },
  {
    path: "/briefings",
    method: "post",
    summary:
      "Start a briefing. A phone sends its key and start time: the same key again returns the same briefing; " +
      "one taken offline against a superseded revision is recorded as such and reported",
    permission: "briefings:run",
    body: { json: startBriefingSchema },
    responses: { "201": "The briefing's id" },
  },
  {
    path: `/briefings/${id}/attendees`,
    method: "post",
    summary: "Record one person signing on",
    permission: "briefings:run",
    body: { json: attendeeSchema },
    responses: { "201": "Recorded" },
  },
  {
    path: `/briefings/${id}/complete`,
    method: "post",
    summary: "Sign the briefing off with the foreman's signature (the same key twice is one sign-off)",
    permission: "briefings:run",
    body: { json: completeBriefingSchema },
    responses: { "200": "Completed" },
  },
  {
    path: "/site-changes",
    method: "post",
    summary: "A site change note against an approved revision, with an optional photograph",
    permission: "site-notes:create",
    body: { multipart: { revisionId: "uuid", text: "text", photo: "file" }, required: ["revisionId", "text"] },
    responses: { "201": "The note" },
  },
  {
    path: "/organisation/logo",
    method: "get",
    summary: "The organisation's logo, as printed on the pack's cover",
    permission: "profile:read",
    responses: { "200": "PNG or JPEG" },
    produces: "image/*",
  },
  {
    path: "/audit/check",
    method: "get",
    summary: "Check the audit trail's hash chain: intact with its head, or the first broken link",
    permission: "audit:read",
    responses: { "200": "The report" },
  },
  {
    path: "/audit/export",
    method: "get",
    summary: "The whole audit trail as CSV, oldest first",
    permission: "audit:read",
    responses: { "200": "CSV" },
    produces: "text/csv",
  },
];

const ERRORS: Record<string, string> = {
  "400": "Malformed JSON or a malformed request",
  "401": "No session, or an API token that is unknown, expired or revoked",
  "403": "The role (or the token's scope) lacks the permission named in the message",
  "404": "Not found (or another organisation's)",
  "413": "Body too large",
  "415": "Wrong content type",
  "422": "Invalid fields, listed in issues",
  "429": "Rate limited: wait as the message says",
};

const jsonSchema = (s: z.ZodType) => z.toJSONSchema(s, { io: "input", unrepresentable: "any" });

function parameters(op: Operation) {
  const path = [...op.path.matchAll(/\{(\w+)\}/g)].map((m) => ({
    name: m[1],
    in: "path",
    required: true,
    schema: { type: "string", format: "uuid" },
  }));
  const query = op.query
    ? Object.entries(
        (jsonSchema(op.query) as { properties?: Record<string, object>; required?: string[] }).properties ?? {},
      ).map(([name, schema]) => ({ name, in: "query", required: false, schema }))
    : [];
  return [...path, ...query];
}

function requestBody(body: Operation["body"]) {
  if (!body) return undefined;
  if (body === "csv") return { required: true, content: { "text/csv": { schema: { type: "string" } } } };
  if ("json" in body) return { required: true, content: { "application/json": { schema: jsonSchema(body.json) } } };
  const properties = Object.fromEntries(
    Object.entries(body.multipart).map(([name, kind]) => [
      name,
      kind === "file"
        ? { type: "string", format: "binary" }
        : { type: "string", ...(kind === "uuid" ? { format: "uuid" } : {}) },
    ]),
  );
  return {
    required: true,
    content: { "multipart/form-data": { schema: { type: "object", properties, required: body.required } } },
  };
}

const errorRef = { "application/json": { schema: { $ref: "#/components/schemas/Error" } } };

export function openApiDocument() {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const op of OPERATIONS) {
    const isPublic = op.permission === "public";
    const responses: Record<string, unknown> = {};
    for (const [status, description] of Object.entries(op.responses))
      responses[status] = {
        description,
        ...(status.startsWith("2") && status !== "204"
          ? {
              content: {
                [op.produces ?? "application/json"]: {
                  schema: op.produces ? { type: "string", format: "binary" } : {},
                },
              },
            }
          : status.startsWith("4")
            ? { content: errorRef }
            : {}),
      };
    if (!isPublic)
      for (const [status, description] of Object.entries(ERRORS))
        responses[status] ??= { description, content: errorRef };
    (paths[op.path] ??= {})[op.method] = {
      summary: op.summary,
      description: isPublic
        ? "Public: no credentials needed."
        : op.permission === "signed-in"
          ? "Any signed-in caller; the record's own rule decides."
          : `Needs the permission \`${op.permission}\`.`,
      ...(op.permission !== "public" && op.permission !== "signed-in" ? { "x-permission": op.permission } : {}),
      security: isPublic ? [] : [{ bearerToken: [] }, { session: [] }],
      parameters: parameters(op),
      requestBody: requestBody(op.body),
      responses,
    };
  }
  return {
    openapi: "3.1.0",
    info: {
      title: "Heftwise API",
      version: "1",
      description:
        "Jobs, load register, assessments and their revisions, scoring, approval, briefings and the audit trail. " +
        "Call it with an API token (`Authorization: Bearer hw_…`, created by an administrator under Organisation → API tokens) " +
        "or from a signed-in browser session. A token acts with its scope's permissions, never more than its creator's, " +
        "and may not sign: approving needs a person. Results support, and do not replace, a competent person's assessment.",
    },
    servers: [{ url: "/api/v1" }],
    security: [{ bearerToken: [] }, { session: [] }],
    paths,
    components: {
      securitySchemes: {
        bearerToken: { type: "http", scheme: "bearer", description: "An API token (hw_…)" },
        session: {
          type: "apiKey",
          in: "cookie",
          name: "next-auth.session-token",
          description: "A signed-in browser session",
        },
      },
      schemas: {
        Error: {
          type: "object",
          properties: {
            error: {
              type: "object",
              properties: {
                code: { type: "string" },
                message: { type: "string" },
                issues: {
                  type: "array",
                  items: { type: "object", properties: { path: { type: "string" }, message: { type: "string" } } },
                },
              },
              required: ["code", "message"],
            },
          },
        },
      },
    },
  };
}
