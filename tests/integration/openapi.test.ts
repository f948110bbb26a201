/**
 * The OpenAPI description against the route files themselves: every method of every route under
 * app/api/v1 is described, nothing described is missing a route, each entry names the permission
 * its handler checks, and bodies come from the zod schemas the handlers validate with.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { openApiDocument, OPERATIONS } from "@/assessments/openapi";
import { approveSchema } from "@/assessments/revisions/approval";
import { jobSchema } from "@/assessments/jobs/schemas";

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? routeFiles(path.join(dir, d.name)) : d.name === "route.ts" ? [path.join(dir, d.name)] : [],
  );
}

/** "app/api/v1/jobs/[id]/route.ts" → "/jobs/{id}". */
const apiPath = (file: string) =>
  file
    .split(path.sep)
    .join("/")
    .replace(/^app\/api\/v1/, "")
    .replace(/\/route\.ts$/, "")
    .replace(/\[(\w+)\]/g, "{$1}") || "/";

const routes = routeFiles("app/api/v1").flatMap((file) => {
  const source = readFileSync(file, "utf8");
  return (["GET", "POST", "PUT", "PATCH", "DELETE"] as const)
    .filter((m) => new RegExp(`export (const|async function|function) ${m}\\b`).test(source))
    .map((m) => {
      // The permission asked for inside this method's own handler (up to the next export).
      const start = source.search(new RegExp(`export (const|async function|function) ${m}\\b`));
      const next = source.slice(start + 1).search(/\nexport /);
      const body = source.slice(start, next < 0 ? undefined : start + 1 + next);
      return {
        key: `${m.toLowerCase()} ${apiPath(file)}`,
        permission: body.match(/requireApiActor\("([^"]+)"\)/)?.[1] ?? null,
      };
    });
});

describe("the OpenAPI description", () => {
  it("describes every /api/v1 route and method, and nothing else", () => {
    const described = OPERATIONS.map((o) => `${o.method} ${o.path}`).sort();
    expect(routes.length).toBeGreaterThan(30);
    expect(described).toEqual(routes.map((r) => r.key).sort());
  });

  it("names, for each operation, the permission its handler checks", () => {
    for (const route of routes) {
      const op = OPERATIONS.find((o) => `${o.method} ${o.path}` === route.key)!;
      if (route.permission) expect(op.permission, route.key).toBe(route.permission);
      else expect(["public", "signed-in"], route.key).toContain(op.permission);
    }
  });

  it("is valid in shape and generated from the handlers' zod schemas", () => {
    const doc = openApiDocument();
    expect(doc.openapi).toBe("3.1.0");
    const approve = doc.paths["/revisions/{id}/approve"].post as {
      requestBody: {
        content: { "application/json": { schema: { properties: Record<string, unknown>; required: string[] } } };
      };
      "x-permission": string;
    };
    const body = approve.requestBody.content["application/json"].schema;
    // The step-up fields exist because approveSchema has them, not because this file lists them.
    expect(Object.keys(body.properties).sort()).toEqual(Object.keys(approveSchema.shape).sort());
    expect(body.required).toEqual(expect.arrayContaining(["password", "contentHash", "signature"]));
    expect(approve["x-permission"]).toBe("reviews:decide");
    const job = doc.paths["/jobs"].post as typeof approve;
    expect(Object.keys(job.requestBody.content["application/json"].schema.properties).sort()).toEqual(
      Object.keys(jobSchema.shape).sort(),
    );
    const list = doc.paths["/assessments"].get as { parameters: { name: string; in: string }[] };
    expect(list.parameters.map((p) => p.name)).toEqual(expect.arrayContaining(["limit", "cursor", "q", "status"]));
    expect(doc.components.securitySchemes.bearerToken).toMatchObject({ type: "http", scheme: "bearer" });
  });
});
