/**
 * `npm run reminders`: sends the reminders due now (review dates ahead and overdue, review requests
 * waiting), each once however often it runs — for the system's scheduler (cron, a systemd timer).
 * On the embedded database run it while the server is stopped, or let the server run it itself
 * (HEFTWISE_REMINDERS=in-process, as the demo does). Exit 0, or 1 if any e-mail failed (it is
 * retried on the next run).
 */
async function main(): Promise<number> {
  const { getDb, closeDb } = await import("@/db/client");
  const { runReminders } = await import("@/assessments/reminders/service");
  await getDb();
  const { sent, failed } = await runReminders();
  process.stdout.write(`Reminders: ${sent} sent${failed ? `, ${failed} failed (retried next run)` : ""}.\n`);
  await closeDb();
  return failed ? 1 : 0;
}

main().then((code) => (process.exitCode = code));
