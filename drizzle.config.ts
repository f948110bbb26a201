import { defineConfig } from "drizzle-kit";

// `npm run db:generate` writes SQL migrations from db/schema.ts; it needs no database.
// The app applies them itself at start (db/migrate.ts), on PGlite or on a PostgreSQL server.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
});
