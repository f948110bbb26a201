import next from "eslint-config-next";
import nextTypescript from "eslint-config-next/typescript";

/**
 * The import direction: app → assessments → lib → db. A module may import its own layer and the
 * layers below it, never one above (so the database knows nothing of the domain, and the domain
 * nothing of pages). Tests and the top-level entry files may import anything.
 */
const above = { db: ["lib", "assessments", "app"], lib: ["assessments", "app"], assessments: ["app"] };
const layerRules = Object.entries(above).map(([layer, forbidden]) => ({
  files: [`${layer}/**/*.{ts,tsx}`],
  rules: {
    "no-restricted-imports": [
      "error",
      {
        patterns: [
          {
            regex: `^(@/|(\\.\\./)+)(${forbidden.join("|")})(/|$)`,
            message: `${layer}/ sits below ${forbidden.join(", ")} in the import direction app → assessments → lib → db: move the shared code down, or the caller up.`,
          },
        ],
      },
    ],
  },
}));

const config = [
  ...next,
  ...nextTypescript,
  ...layerRules,
  {
    ignores: [
      ".next/**",
      "node_modules/**",
      "data/**",
      "test-results/**",
      "playwright-report/**",
      "db/migrations/**",
      "next-env.d.ts",
    ],
  },
];

export default config;
