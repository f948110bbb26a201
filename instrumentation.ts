/**
 * Runs once when the server process starts: check the configuration, then open and migrate the
 * database so the first request does not pay for it. A bad configuration stops the process here
 * with the variable named.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startServer } = await import("./lib/server-start");
  await startServer();
  // The reminder job inside the server, for installs without a scheduler (the demo): the server
  // owns the embedded database, so `npm run reminders` could not open it while it runs.
  if (process.env.HEFTWISE_REMINDERS === "in-process") {
    const { runReminders } = await import("./assessments/reminders/service");
    const run = () =>
      runReminders().catch((err: unknown) => console.error("The reminder job failed:", (err as Error).message));
    setTimeout(run, 15_000).unref();
    setInterval(run, 60 * 60_000).unref();
  }
}
