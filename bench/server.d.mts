import type { ChildProcess } from "node:child_process";

/** See bench/server.mjs. */
export function startBenchServer(
  port: number,
  env?: Record<string, string>,
): Promise<{ proc: ChildProcess; stop(): void }>;
