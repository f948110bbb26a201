import { closeDb, getDb } from "@/db/client";
import { config, ConfigError } from "./config";

export async function startServer(): Promise<void> {
  try {
    config();
    await getDb();
  } catch (err) {
    const message = err instanceof ConfigError ? err.message : `Heftwise cannot start: ${(err as Error).message}`;
    console.error(message);
    process.exit(1);
  }
  // Next's own signal handling would exit before PGlite has closed its files
  // (NEXT_MANUAL_SIG_HANDLE=1 is set by `npm start` and the demo): close, then exit.
  let closing = false;
  const shutdown = async () => {
    if (closing) return;
    closing = true;
    await closeDb().catch((err) => console.error("closing the database failed:", err));
    process.exit(0);
  };
  process.on("SIGTERM", shutdown);
  process.on("SIGINT", shutdown);
}
