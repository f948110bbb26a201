/**
 * Runs once when the server process starts: check the configuration, then open and migrate the
 * database so the first request does not pay for it. A bad configuration stops the process here
 * with the variable named.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startServer } = await import("./lib/server-start");
  await startServer();
}
