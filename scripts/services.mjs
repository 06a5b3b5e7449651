// Local Redis and PostgreSQL for the scale-out tests and benchmarks, on free
// loopback ports in temporary folders.
//
//   node scripts/services.mjs run -- <command> [args…]
//
// starts what is not already reachable (REDIS_URL / DATABASE_URL of the
// caller are used as they are when they answer), runs the command with
// REDIS_URL and DATABASE_URL set, then stops every server it started and
// removes its folders: on success, on failure and on SIGINT/SIGTERM. Exits
// with the command's code. Missing servers are installed from Debian's
// packages (redis-server, postgresql) when running as root.
import { spawn, spawnSync } from "node:child_process";
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import net from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";

const isRoot = process.getuid?.() === 0;
let aptUpdated = false;

function log(msg) {
  console.log(`[services] ${msg}`);
}

/** A port that was free on 127.0.0.1 a moment ago. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.unref();
    s.on("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

/** Whether something accepts TCP connections at host:port within timeout_ms. */
function reachable(host, port, timeout_ms = 1000) {
  return new Promise((resolve) => {
    const sock = net.connect({ host, port });
    const done = (ok) => {
      sock.destroy();
      resolve(ok);
    };
    sock.setTimeout(timeout_ms, () => done(false));
    sock.on("connect", () => done(true));
    sock.on("error", () => done(false));
  });
}

async function urlReachable(url) {
  if (!url) return false;
  try {
    const u = new URL(url);
    const host = u.hostname || "127.0.0.1";
    if (!["127.0.0.1", "localhost", "::1", "[::1]"].includes(host)) {
      log(`${u.protocol}//${host}: only loopback servers are used by the tests; starting local ones`);
      return false;
    }
    return await reachable(host.replace(/^\[|\]$/g, ""), Number(u.port || (u.protocol === "redis:" ? 6379 : 5432)));
  } catch {
    return false;
  }
}

function which(cmd) {
  const r = spawnSync("sh", ["-c", `command -v ${cmd}`], { encoding: "utf8" });
  return r.status === 0 ? r.stdout.trim() : null;
}

function aptInstall(pkg) {
  if (!isRoot) return false;
  if (!aptUpdated) {
    log("apt-get update");
    spawnSync("apt-get", ["update"], { stdio: "inherit" });
    aptUpdated = true;
  }
  log(`installing Debian's ${pkg} package`);
  const r = spawnSync("apt-get", ["install", "-y", "--no-install-recommends", pkg], {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  return r.status === 0;
}

function redisBinary() {
  let bin = which("redis-server");
  if (!bin && aptInstall("redis-server")) bin = which("redis-server");
  if (!bin)
    throw new Error("redis-server is missing: install Debian's redis-server package (apt-get install redis-server)");
  return bin;
}

function postgresBinDir() {
  const find = () => {
    const initdb = which("initdb");
    if (initdb && which("pg_ctl")) return path.dirname(initdb);
    const root = "/usr/lib/postgresql";
    if (!existsSync(root)) return null;
    const versions = readdirSync(root).sort((a, b) => Number(b) - Number(a));
    for (const v of versions) if (existsSync(path.join(root, v, "bin", "initdb"))) return path.join(root, v, "bin");
    return null;
  };
  let dir = find();
  if (!dir && aptInstall("postgresql")) dir = find();
  if (!dir) throw new Error("PostgreSQL's initdb/pg_ctl are missing: install Debian's postgresql package");
  return dir;
}

/** Runs a command as the unprivileged postgres (or nobody) user when we are root: initdb refuses root. */
function asDbUser(cmd, args) {
  if (!isRoot) return [cmd, args];
  const user = spawnSync("id", ["-u", "postgres"]).status === 0 ? "postgres" : "nobody";
  return ["runuser", ["-u", user, "--", cmd, ...args]];
}

function dbUserIds() {
  const user = spawnSync("id", ["-u", "postgres"]).status === 0 ? "postgres" : "nobody";
  const uid = Number(spawnSync("id", ["-u", user], { encoding: "utf8" }).stdout);
  const gid = Number(spawnSync("id", ["-g", user], { encoding: "utf8" }).stdout);
  return { uid, gid };
}

async function waitFor(check, timeout_ms, what) {
  const end = Date.now() + timeout_ms;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${what} did not start within ${timeout_ms / 1000} s`);
}

/** Starts a Redis on a free loopback port (or the given one); resolves to { url, port, stop }. */
export async function startRedis(wantedPort) {
  const bin = redisBinary();
  const dir = mkdtempSync(path.join(tmpdir(), "ozone-redis-"));
  const port = wantedPort ?? (await freePort());
  const child = spawn(
    bin,
    ["--port", String(port), "--bind", "127.0.0.1", "--dir", dir, "--save", "", "--appendonly", "no"],
    { stdio: ["ignore", "ignore", "inherit"] },
  );
  let exited = false;
  child.on("exit", () => {
    exited = true;
  });
  await waitFor(async () => !exited && (await reachable("127.0.0.1", port)), 15_000, "redis-server");
  log(`redis-server pid ${child.pid} on 127.0.0.1:${port}`);
  return {
    url: `redis://127.0.0.1:${port}`,
    port,
    async stop() {
      if (!exited) {
        child.kill("SIGTERM");
        await waitFor(async () => exited, 10_000, "redis-server shutdown").catch(() => child.kill("SIGKILL"));
      }
      rmSync(dir, { recursive: true, force: true });
      log(`redis-server on port ${port} stopped`);
    },
  };
}

/** Creates a cluster with initdb in a temporary folder and starts it with pg_ctl; resolves to { url, stop }. */
export async function startPostgres() {
  const bin = postgresBinDir();
  const dir = mkdtempSync(path.join(tmpdir(), "ozone-pg-"));
  const data = path.join(dir, "data");
  const port = await freePort();
  if (isRoot) {
    const { uid, gid } = dbUserIds();
    chownSync(dir, uid, gid);
  }
  const run = (cmd, args) => {
    const [c, a] = asDbUser(path.join(bin, cmd), args);
    const r = spawnSync(c, a, { encoding: "utf8" });
    if (r.status !== 0) throw new Error(`${cmd} failed: ${r.stderr || r.stdout}`);
  };
  run("initdb", ["-D", data, "-U", "ozone", "--auth=trust", "--encoding=UTF8", "--locale=C", "--no-sync"]);
  run("pg_ctl", [
    "start",
    "-D",
    data,
    "-w",
    "-t",
    "30",
    "-l",
    path.join(dir, "server.log"),
    "-o",
    `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200`,
  ]);
  log(`postgres (pg_ctl) on 127.0.0.1:${port}, data in ${data}`);
  return {
    url: `postgres://ozone@127.0.0.1:${port}/postgres`,
    async stop() {
      try {
        run("pg_ctl", ["stop", "-D", data, "-m", "fast", "-w"]);
      } catch (e) {
        log(`pg_ctl stop: ${e.message}`);
      }
      rmSync(dir, { recursive: true, force: true });
      log(`postgres on port ${port} stopped`);
    },
  };
}

/** Starts what is not reachable yet; returns the environment to use and a stop function for what was started. */
export async function ensureServices(env = process.env) {
  const started = [];
  const out = {};
  const stopAll = async () => {
    for (const s of started.splice(0).reverse()) await s.stop().catch((e) => log(`stop failed: ${e.message}`));
  };
  try {
    if (await urlReachable(env.REDIS_URL)) out.REDIS_URL = env.REDIS_URL;
    else {
      const r = await startRedis();
      started.push(r);
      out.REDIS_URL = r.url;
    }
    if (await urlReachable(env.DATABASE_URL)) out.DATABASE_URL = env.DATABASE_URL;
    else {
      const p = await startPostgres();
      started.push(p);
      out.DATABASE_URL = p.url;
    }
  } catch (e) {
    await stopAll();
    throw e;
  }
  return { env: out, stop: stopAll };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [mode, sep, cmd, ...args] = process.argv.slice(2);
  if (mode !== "run" || sep !== "--" || !cmd) {
    console.error("usage: node scripts/services.mjs run -- <command> [args…]");
    process.exit(2);
  }
  const { env, stop } = await ensureServices();
  let child = null;
  let stopping = false;
  const finish = async (code) => {
    if (stopping) return;
    stopping = true;
    await stop();
    process.exit(code);
  };
  for (const sig of ["SIGINT", "SIGTERM"]) {
    process.on(sig, () => {
      child?.kill(sig);
      void finish(130);
    });
  }
  child = spawn(cmd, args, { stdio: "inherit", env: { ...process.env, ...env } });
  child.on("error", (e) => {
    log(`${cmd}: ${e.message}`);
    void finish(1);
  });
  child.on("exit", (code, signal) => void finish(code ?? (signal ? 1 : 0)));
}
