/**
 * The production server: Next.js's own request handler behind a plain Node.js HTTP server, so that
 * forwarded-address headers can be cleaned against the socket before Next.js sees them (see
 * lib/client-address.ts). `npm start` and the demo run it; everything else is Next.js as usual.
 * PORT and HOSTNAME choose where it listens (3000 on 127.0.0.1 by default).
 */
import { createServer } from "node:http";
import next from "next";
import { cleanForwardedHeaders } from "./lib/client-address";
import { config } from "./lib/config";

const port = Number(process.env.PORT ?? 3000);
const hostname = process.env.HOSTNAME ?? "127.0.0.1";

const app = next({ dev: false, hostname, port });
const handle = app.getRequestHandler();

app
  .prepare()
  .then(() => {
    const trusted = config().HEFTWISE_TRUSTED_PROXIES;
    createServer((req, res) => {
      cleanForwardedHeaders(req.headers, req.socket.remoteAddress, trusted);
      void handle(req, res);
    }).listen(port, hostname, () => console.log(`✓ Ready on http://${hostname}:${port}`));
  })
  .catch((err) => {
    console.error(`Heftwise cannot start: ${(err as Error).message}`);
    process.exit(1);
  });
