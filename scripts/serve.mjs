// Serves the built app (next's request handler in a plain Node HTTP server) on PORT
// (default 3000), host HOST (default all interfaces). The one thing it adds to
// `next start`: the socket's address is appended to X-Forwarded-For, so that its
// last entry is always the real peer, whatever a client sends (`next start` keeps
// a client's header as it is). The rate limits count by that entry
// (lib/service/rateLimit.ts; OZONE_TRUSTED_PROXIES for proxies in front).
import { createServer } from "node:http";
import next from "next";

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
