/** Entry point of an engine worker thread (bundled to .engine/worker.mjs). */
import { parentPort } from "node:worker_threads";
import { EngineError } from "../errors";
import { type EngineJob, runJob } from "./taskTable";

parentPort?.on("message", (msg: { id: number; job: EngineJob }) => {
  try {
    const value = runJob(msg.job);
    // bytes are moved to the main thread, not copied
    const transfer = value.result instanceof Uint8Array ? [value.result.buffer as ArrayBuffer] : [];
    parentPort?.postMessage({ id: msg.id, ok: true, value }, transfer);
  } catch (e) {
    const err =
      e instanceof EngineError
        ? { ...e.toJSON(), name: e.name, problems: (e as { problems?: unknown }).problems }
        : { code: "engine-failure", message: e instanceof Error ? e.message : String(e) };
    parentPort?.postMessage({ id: msg.id, ok: false, error: err });
  }
});
