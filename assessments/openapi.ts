/**
 * The OpenAPI description of `/api/v1`, served at `/api/v1/openapi.json`. Request bodies come from
 * the same zod schemas the handlers use (`z.toJSONSchema`), so the description cannot drift from
 * what is validated.
 */
import { z } from "zod";
import { jobSchema } from "@/assessments/jobs/schemas";
import { componentSchema } from "@/assessments/load-register/schemas";
import { taskSchema } from "@/assessments/method-statement/content";
import { createAssessmentSchema, saveRevisionSchema, submitRevisionSchema } from "@/assessments/revisions/schemas";
import { scoreRequestSchema } from "@/assessments/rules/request";

const schema = (s: z.ZodType) => z.toJSONSchema(s, { io: "input", unrepresentable: "any" });
const json = (ref: string) => ({
  content: { "application/json": { schema: { $ref: `#/components/schemas/${ref}` } } },
});
const errors = {
  "400": { description: "Malformed JSON", ...json("Error") },
  "401": { description: "Not signed in", ...json("Error") },
  "403": { description: "The role does not allow this", ...json("Error") },
  "404": { description: "Not found (or another organisation's)", ...json("Error") },
  "413": { description: "Body too large", ...json("Error") },
  "415": { description: "Wrong content type", ...json("Error") },
  "422": { description: "Invalid fields, listed in issues", ...json("Error") },
};
const idParam = (name = "id") => ({ name, in: "path", required: true, schema: { type: "string" } });
const pageParams = [
  { name: "limit", in: "query", schema: { type: "integer", minimum: 1, maximum: 100, default: 25 } },
  { name: "cursor", in: "query", schema: { type: "string" }, description: "nextCursor of the previous page" },
];
const ok = (description: string, ref?: string) => ({ description, ...(ref ? json(ref) : {}) });

export function openApiDocument() {
  return {
    openapi: "3.1.0",
    info: {
      title: "Heftwise API",
      version: "1",
      description:
        "Jobs, load register, assessments, revisions, tasks and scoring. Every route needs a signed-in session and the role the permission table gives.",
    },
    servers: [{ url: "/api/v1" }],
    paths: {
      "/score": {
        post: {
          summary: "Score one request or an array of them",
          requestBody: json("ScoreRequest"),
          responses: { "200": ok("Result(s), in order"), ...errors },
        },
      },
      "/jobs": {
        get: {
          summary: "List jobs",
          parameters: pageParams,
          responses: { "200": ok("A page of jobs", "Page"), ...errors },
        },
        post: { summary: "Create a job", requestBody: json("Job"), responses: { "201": ok("The job"), ...errors } },
      },
      "/jobs/{id}": {
        get: { summary: "A job", parameters: [idParam()], responses: { "200": ok("The job"), ...errors } },
        put: {
          summary: "Update a job",
          parameters: [idParam()],
          requestBody: json("Job"),
          responses: { "200": ok("The job"), ...errors },
        },
      },
      "/components": {
        get: {
          summary: "List the load register",
          parameters: [
            ...pageParams,
            { name: "q", in: "query", schema: { type: "string" } },
            { name: "massSource", in: "query", schema: { enum: ["weighed", "datasheet", "estimated"] } },
            { name: "grip", in: "query", schema: { enum: ["good", "fair", "poor"] } },
            { name: "sort", in: "query", schema: { enum: ["name", "-name", "massKg", "-massKg"] } },
          ],
          responses: { "200": ok("A page of components", "Page"), ...errors },
        },
        post: {
          summary: "Add a component",
          requestBody: json("Component"),
          responses: { "201": ok("The component"), ...errors },
        },
      },
      "/components/{id}": {
        get: {
          summary: "A component with its attachments",
          parameters: [idParam()],
          responses: { "200": ok("The component"), ...errors },
        },
        put: {
          summary: "Update a component",
          parameters: [idParam()],
          requestBody: json("Component"),
          responses: { "200": ok("The component"), ...errors },
        },
      },
      "/components/{id}/attachments": {
        post: {
          summary: "Attach a PDF data sheet or a photograph (type checked by content, at most 10 MB)",
          parameters: [idParam()],
          requestBody: {
            content: {
              "multipart/form-data": {
                schema: {
                  type: "object",
                  properties: { file: { type: "string", format: "binary" } },
                  required: ["file"],
                },
              },
            },
          },
          responses: { "201": ok("The attachment"), ...errors },
        },
      },
      "/attachments/{id}": {
        get: {
          summary: "Download an attachment",
          parameters: [idParam()],
          responses: { "200": { description: "The file" }, ...errors },
        },
        delete: {
          summary: "Remove an attachment",
          parameters: [idParam()],
          responses: { "204": { description: "Removed" }, ...errors },
        },
      },
      "/components/import": {
        post: {
          summary: "Import components from CSV, all or nothing (?dryRun=1 previews each row's errors)",
          parameters: [{ name: "dryRun", in: "query", schema: { enum: ["1"] } }],
          requestBody: { content: { "text/csv": { schema: { type: "string" } } } },
          responses: { "200": ok("Preview"), "201": ok("Imported"), ...errors },
        },
      },
      "/components/import/template": {
        get: { summary: "The CSV template", responses: { "200": { description: "text/csv" }, ...errors } },
      },
      "/assessments": {
        get: {
          summary: "List assessments (latest revision of each)",
          parameters: [
            ...pageParams,
            ...["q", "status", "jobId", "worstBand", "authorId", "sort"].map((name) => ({
              name,
              in: "query",
              schema: { type: "string" },
            })),
          ],
          responses: { "200": ok("A page of assessments", "Page"), ...errors },
        },
        post: {
          summary: "Create an assessment, blank or from a template",
          requestBody: json("CreateAssessment"),
          responses: { "201": ok("Ids of the assessment and its draft"), ...errors },
        },
      },
      "/revisions/{id}": {
        get: {
          summary: "A revision with its content and stored results",
          parameters: [idParam()],
          responses: { "200": ok("The revision"), ...errors },
        },
        put: {
          summary: "Save a draft (409 when the version is stale or the revision locked)",
          parameters: [idParam()],
          requestBody: json("SaveRevision"),
          responses: { "200": ok("The new version"), "409": ok("Conflict", "Error"), ...errors },
        },
      },
      "/revisions/{id}/submit": {
        post: {
          summary: "Submit a complete draft to an approver",
          parameters: [idParam()],
          requestBody: json("SubmitRevision"),
          responses: { "200": ok("Submitted"), "409": ok("Conflict", "Error"), ...errors },
        },
      },
      "/revisions/{id}/tasks": {
        get: {
          summary: "The draft's tasks with their scores",
          parameters: [idParam()],
          responses: { "200": ok("Tasks"), ...errors },
        },
        post: {
          summary: "Add a task",
          parameters: [idParam()],
          requestBody: json("TaskChange"),
          responses: { "201": ok("The new version"), "409": ok("Conflict", "Error"), ...errors },
        },
      },
      "/revisions/{id}/tasks/{taskId}": {
        put: {
          summary: "Replace a task",
          parameters: [idParam(), idParam("taskId")],
          requestBody: json("TaskChange"),
          responses: { "200": ok("The new version"), "409": ok("Conflict", "Error"), ...errors },
        },
        delete: {
          summary: "Remove a task",
          parameters: [idParam(), idParam("taskId")],
          requestBody: {
            content: {
              "application/json": {
                schema: { type: "object", properties: { version: { type: "integer" } }, required: ["version"] },
              },
            },
          },
          responses: { "200": ok("The new version"), ...errors },
        },
      },
    },
    components: {
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
        Page: {
          type: "object",
          properties: {
            items: { type: "array", items: {} },
            nextCursor: { type: ["string", "null"] },
            total: { type: "integer" },
          },
        },
        ScoreRequest: schema(scoreRequestSchema),
        Job: schema(jobSchema),
        Component: schema(componentSchema),
        CreateAssessment: schema(createAssessmentSchema),
        SaveRevision: schema(saveRevisionSchema),
        SubmitRevision: schema(submitRevisionSchema),
        TaskChange: schema(z.object({ version: z.number().int(), task: taskSchema })),
      },
    },
  };
}
