// Serves the built app (next's request handler in a plain Node HTTP server) on PORT
// (default 3000), host HOST (default all interfaces). The one thing it adds to
// `next start`: the socket's address is appended to X-Forwarded-For, so that its
// last entry is always the real peer, whatever a client sends (`next start` keeps
// a client's header as it is). The rate limits count by that entry
// (lib/service/rateLimit.ts; OZONE_TRUSTED_PROXIES for proxies in front).
import { createServer } from "node:http";
import { availableParallelism } from "node:os";
import next from "next";

// OZONE_ENGINE_WORKERS is checked as lib/runtime/pool.ts checks it (engineWorkerCount), before anything
// listens, so that a bad value stops the start instead of failing the first analysis
const workers = process.env.OZONE_ENGINE_WORKERS;
const maxWorkers = 4 * Math.max(1, availableParallelism());
if (workers && !(/^[1-9][0-9]*$/.test(workers) && Number(workers) <= maxWorkers)) {
  console.error(
    `serve: invalid OZONE_ENGINE_WORKERS: ${JSON.stringify(workers)} (expected a whole number from 1 to ${maxWorkers})`,
  );
  process.exit(2);
}

const port = Number(process.argv[2] ?? process.env.PORT ?? 3000);
const hostname = process.env.HOST || undefined;
const app = next({ dev: false, dir: process.cwd(), port, hostname: hostname ?? "localhost" });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  const peer = req.socket.remoteAddress ?? "unknown";
  const prior = req.headers["x-forwarded-for"];
  req.headers["x-forwarded-for"] = prior ? `${prior}, ${peer}` : peer;
  void handle(req, res);
});
server.listen(port, hostname, () => console.log(`serving on http://${hostname ?? "localhost"}:${port}`));
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => server.close(() => process.exit(0)));
