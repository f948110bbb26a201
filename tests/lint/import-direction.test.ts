/**
 * The import direction app → assessments → lib → db is a lint rule (eslint.config.mjs): an upward
 * import fails `npm run lint`. These cases lint source text as if it sat in each layer.
 */
import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

const eslint = new ESLint({ cwd: process.cwd() });

async function restricted(filePath: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(source, { filePath });
  return result.messages.filter((m) => m.ruleId === "no-restricted-imports").map((m) => m.message);
}

describe("import direction", () => {
  it("refuses an upward import from each layer, by alias and by relative path", async () => {
    expect(
      await restricted("db/probe.ts", 'import { config } from "@/lib/config";\nexport const c = config;\n'),
    ).toHaveLength(1);
    expect(
      await restricted(
        "db/probe.ts",
        'import { scoreNiosh } from "../assessments/rules/niosh";\nexport const s = scoreNiosh;\n',
      ),
    ).toHaveLength(1);
    expect(
      await restricted(
        "lib/auth/probe.ts",
        'import { scoreNiosh } from "@/assessments/rules/niosh";\nexport const s = scoreNiosh;\n',
      ),
    ).toHaveLength(1);
    expect(
      await restricted("lib/probe.ts", 'import { metadata } from "../app/layout";\nexport const m = metadata;\n'),
    ).toHaveLength(1);
    expect(
      await restricted(
        "assessments/rules/probe.ts",
        'import { metadata } from "@/app/layout";\nexport const m = metadata;\n',
      ),
    ).toHaveLength(1);
  }, 60_000);

  it("allows imports downward and within a layer", async () => {
    expect(await restricted("lib/probe.ts", 'import { getDb } from "@/db/client";\nexport const g = getDb;\n')).toEqual(
      [],
    );
    expect(
      await restricted(
        "assessments/probe.ts",
        'import { config } from "@/lib/config";\nimport { getDb } from "@/db/client";\nexport const x = [config, getDb];\n',
      ),
    ).toEqual([]);
    expect(
      await restricted(
        "app/probe.tsx",
        'import { scoreNiosh } from "@/assessments/rules/niosh";\nexport const s = scoreNiosh;\n',
      ),
    ).toEqual([]);
    expect(await restricted("db/probe.ts", 'import * as schema from "./schema";\nexport const s = schema;\n')).toEqual(
      [],
    );
  }, 60_000);
});
