/**
 * Where a command-line sweep's levels run: in engine worker threads of the
 * bundled worker script, as many as the service's pool (so the warm-started
 * chains, and so the result, are the same as the service's), or in this
 * thread when no script is given (in-process use), with the same number of
 * chains run one after another.
 */

import type { MechanismSource } from "../engine/mechanism-source";
import { compileSource } from "../engine/mechanism-source";
import { EnginePool, POOL_DEFAULTS } from "../engine/pool";
import { runLevelBatch } from "../profiles/runLevelBatch";
import { inlineExecutor, type SweepExecutor } from "../profiles/runSweep";

export interface ClosableExecutor extends SweepExecutor {
  close(): Promise<void>;
}

export function sweepExecutor(src: MechanismSource, workerScript: string | undefined): ClosableExecutor {
  if (!workerScript) {
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
