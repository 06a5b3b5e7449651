/**
 * Where a job's engine tasks run: on the job back end's task runner when it
 * distributes them (BullMQ queue workers, `ctx.tasks`), else in this process's
 * engine pool. One place for the choice that sweeps, runs and Monte Carlo jobs
 * make.
 */
import "server-only";
import type { TaskRunner } from "../jobs/types";
import { enginePool, POOL_DEFAULTS } from "../runtime/pool";
import type { EngineJob, EngineJobResult } from "../runtime/taskTable";

/** The result of each task kind. */
type ResultOf = { [R in EngineJobResult as R["kind"]]: R["result"] };

export interface EngineTasks {
  /** how many tasks are worth running at once */
  workers: number;
  /** runs one task and resolves to its result */
  run<K extends EngineJob["kind"]>(job: Extract<EngineJob, { kind: K }>): Promise<ResultOf[K]>;
}

/** `timeout_ms`: the pool's limit per task (queue workers keep their own per kind). */
export function engineTasks(tasks?: TaskRunner, timeout_ms?: number): EngineTasks {
  return {
    workers: tasks ? tasks.parallel : POOL_DEFAULTS.size,
    async run<K extends EngineJob["kind"]>(job: Extract<EngineJob, { kind: K }>): Promise<ResultOf[K]> {
      const out = tasks ? await tasks.run(job) : await enginePool().run<K>(job, timeout_ms);
      return (out as { result: ResultOf[K] }).result;
    },
  };
}
