import { defineConfig, type TestProjectInlineConfiguration } from "vitest/config";

// The domain's services are marked server-only (they must never reach a browser bundle); tests run
// them directly, as the server does.
const alias = { "@": import.meta.dirname, "server-only": `${import.meta.dirname}/node_modules/server-only/empty.js` };
const common = { setupFiles: ["tests/integration/setup.ts"], testTimeout: 20_000, hookTimeout: 30_000 };

// Unit and integration tests run on in-memory PGlite with the real migrations. When
// TEST_DATABASE_URL names a PostgreSQL server, the integration suite runs a second time against it
// (each test file in a database of its own).
const projects: TestProjectInlineConfiguration[] = [
  {
    resolve: { alias },
    test: {
      name: "pglite",
      include: [
        "tests/rules/**/*.test.ts",
        "tests/lift-plan/**/*.test.ts",
        "tests/lib/**/*.test.ts",
        "tests/pack/**/*.test.ts",
        "tests/integration/**/*.test.ts",
        "tests/cli/**/*.test.ts",
        "tests/lint/**/*.test.ts",
      ],
      env: { HEFTWISE_DATA_DIR: "memory://", NODE_ENV: "test" },
      ...common,
    },
  },
];
if (process.env.TEST_DATABASE_URL)
  projects.push({
    resolve: { alias },
    test: {
      name: "postgres",
      include: ["tests/integration/**/*.test.ts", "tests/postgres/**/*.test.ts"],
      env: { HEFTWISE_TEST_SERVER: process.env.TEST_DATABASE_URL, NODE_ENV: "test" },
      ...common,
    },
  });

export default defineConfig({ test: { projects } });
