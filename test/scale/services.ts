/** The servers the scale suite talks to (started by scripts/services.mjs), and worker processes it starts. */
import { type ChildProcess, spawn } from "node:child_process";

export function redisUrl(): string {
  const u = process.env.REDIS_URL;
  if (!u) throw new Error("REDIS_URL is not set: run the suite through `node scripts/services.mjs run -- …`");
  return u;
}

export function databaseUrl(): string {
  const u = process.env.DATABASE_URL;
  if (!u) throw new Error("DATABASE_URL is not set: run the suite through `node scripts/services.mjs run -- …`");
  return u;
}

export interface WorkerProcess {
  proc: ChildProcess;
  /** the worker's name in Redis (the processor of its entries) */
  name: string;
  output: () => string;
  /** SIGKILL: a machine that died, no clean shutdown */
  kill(): Promise<void>;
  /** SIGTERM: a clean stop */
  stop(): Promise<void>;
}

const exited = (p: ChildProcess) =>
  new Promise<void>((resolve) => {
    if (p.exitCode !== null || p.signalCode !== null) resolve();
    else p.once("exit", () => resolve());
  });

/** Starts `npm run worker` (node scripts/worker.mjs) with the given environment; resolves when it is taking entries. */
export async function startWorker(env: Record<string, string>): Promise<WorkerProcess> {
  const proc = spawn(process.execPath, ["scripts/worker.mjs"], {
    env: { ...process.env, ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let out = "";
  proc.stdout?.on("data", (d) => {
    out += d;
  });
  proc.stderr?.on("data", (d) => {
    out += d;
  });
  const name = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`worker did not start within 60 s:\n${out}`)), 60_000);
    const onData = () => {
      const m = /queue worker (\S+):/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]);
      }
    };
    proc.stdout?.on("data", onData);
    proc.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`worker exited with code ${code} before starting:\n${out}`));
    });
  });
  return {
    proc,
    name,
    output: () => out,
    async kill() {
      proc.kill("SIGKILL");
      await exited(proc);
    },
    async stop() {
      proc.kill("SIGTERM");
      const t = setTimeout(() => proc.kill("SIGKILL"), 15_000);
      await exited(proc);
      clearTimeout(t);
    },
  };
}
