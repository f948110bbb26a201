// Loaded into the server by `npm run bench:api` only (node --expose-gc --import this file): on
// SIGUSR2, a full garbage collection, then the process's memory as one JSON line on stderr. What
// is still held after a full collection is what a leak would grow.
process.on("SIGUSR2", () => {
  globalThis.gc?.();
  const m = process.memoryUsage();
  process.stderr.write(
    `HEFTWISE-MEMORY ${JSON.stringify({ rss: m.rss, heapUsed: m.heapUsed, external: m.external })}\n`,
  );
});
