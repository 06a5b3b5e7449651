import type { ChildProcess } from "node:child_process";

/** See bench/server.mjs. */
export function startBenchServer(
  port: number,
  env?: Record<string, string>,
): Promise<{ proc: ChildProcess; stop(): void }>;

/** See bench/server.mjs: the reference sweep of the standard profile as a job of the server at `base`; its result id. */
export function sweepAsJob(base: string): Promise<string>;
