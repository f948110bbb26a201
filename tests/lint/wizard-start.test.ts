/**
 * What a revision's page makes the phone download and run before the adviser touches anything: its
 * client components and everything they import statically. zod (and the schemas built with it) is
 * loaded when the form is first used (wizard/checks.ts); a static import of a schema from any of
 * these modules would bring it back into the start of the page, unnoticed. This walks the imports
 * as the bundler does: type-only imports and dynamic import() are not followed.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

const root = process.cwd();
const config = ts.parseJsonConfigFileContent(
  ts.readConfigFile(path.join(root, "tsconfig.json"), ts.sys.readFile).config,
  ts.sys,
  root,
);
const page = path.join(root, "app/(app)/revisions/[id]/page.tsx");

/** The specifiers a module imports for its values (what a bundler must load with it). */
function valueImports(file: string): string[] {
  const source = ts.createSourceFile(file, readFileSync(file, "utf8"), ts.ScriptTarget.Latest, true);
  const out: string[] = [];
  for (const statement of source.statements) {
    if (ts.isImportDeclaration(statement)) {
      const clause = statement.importClause;
      const typesOnly =
        clause &&
        (clause.isTypeOnly ||
          (!clause.name &&
            clause.namedBindings &&
            ts.isNamedImports(clause.namedBindings) &&
            clause.namedBindings.elements.length > 0 &&
            clause.namedBindings.elements.every((e) => e.isTypeOnly)));
      if (!typesOnly) out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    } else if (ts.isExportDeclaration(statement) && statement.moduleSpecifier && !statement.isTypeOnly) {
      out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    }
  }
  return out;
}

const resolve = (specifier: string, from: string) =>
  ts.resolveModuleName(specifier, from, config.options, ts.sys).resolvedModule?.resolvedFileName;

const isClient = (file: string) => /^\s*["']use client["']/.test(readFileSync(file, "utf8"));

/** The packages reached from `start` through static value imports, and the project files on the way. */
function reach(start: string, onlyFromClient: boolean) {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string, client: boolean) => {
    const key = `${file}|${client}`;
    if (files.has(key)) return;
    files.add(key);
    const nowClient = client || isClient(file);
    for (const specifier of valueImports(file)) {
      const resolved = resolve(specifier, file);
      if (!resolved || resolved.includes("/node_modules/")) {
        if (nowClient || !onlyFromClient) packages.add(specifier);
        continue;
      }
      visit(resolved, nowClient);
    }
  };
  visit(start, !onlyFromClient);
  return { files: [...files].map((k) => path.relative(root, k.split("|")[0])), packages: [...packages] };
}

const zodLike = (p: string) => p === "zod" || p.startsWith("zod/") || p === "@hookform/resolvers/zod";

describe("a revision's page starts without the form checks", () => {
  it("its client components reach no zod through static imports", () => {
    const { files, packages } = reach(page, true);
    expect(files).toContain("app/(app)/revisions/[id]/wizard/loads-step.tsx");
    expect(packages.filter(zodLike)).toEqual([]);
  });

  it("the walk does find zod where it is: the checks the wizard loads later, and the page's server side", () => {
    const checks = reach(path.join(root, "app/(app)/revisions/[id]/wizard/validation.ts"), false);
    expect(checks.packages.filter(zodLike).sort()).toEqual(["@hookform/resolvers/zod", "zod"]);
    expect(reach(page, false).packages).toContain("zod");
  });
});
