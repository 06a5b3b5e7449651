/**
 * Where a command-line sweep's levels run. A sweep of several warm-started
 * chains (the 24-hour mode, or --parallel parallel) runs in engine worker
 * threads of the bundled worker script, as many as the service's pool, so
 * its chains, and so its result, are the service's. A sweep of one chain
 * (the instantaneous mode by default) runs in this thread: the same levels
 * in the same order, without loading the engine into worker threads (1.1 s
 * of CPU of 3.5 s for the 51-level sweep, measured on the loaded 2-core
 * machine). Without a script (in-process use) every sweep runs here, its
 * chains one after another.
 */

import type { MechanismSource } from "../engine/mechanismSource";
import { compileSource } from "../engine/mechanismSource";
import { runLevelBatch } from "../profiles/runLevelBatch";
import { inlineExecutor, type SweepExecutor } from "../profiles/runSweep";
import { EnginePool, POOL_DEFAULTS } from "../runtime/pool";

export interface ClosableExecutor extends SweepExecutor {
  close(): Promise<void>;
}

export function sweepExecutor(
  src: MechanismSource,
  workerScript: string | undefined,
  severalChains: boolean,
): ClosableExecutor {
  if (!workerScript || !severalChains) {
    const mech = compileSource(src);
    const inline = inlineExecutor((b) => runLevelBatch(mech, { id: src.id, title: src.title }, b), POOL_DEFAULTS.size);
    return { ...inline, close: async () => {} };
  }
  const pool = new EnginePool({ ...POOL_DEFAULTS, script: workerScript });
  return {
    workers: POOL_DEFAULTS.size,
    run: async (batch) => (await pool.run({ kind: "profile-levels", mechanism: src, batch })).result,
    close: () => pool.close(),
  };
}
