// What the browser reads (GET /api/jobs/{id} through getJob, and the
// server-sent events of jobEvents) when the service's job back end is BullMQ:
// the same JobView as with the embedded back end, progress on the way, the
// result's links at the end. The service chooses BullMQ because REDIS_URL is
// set, as a web instance configured for several machines does.
import { execFileSync } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BullmqJobBackend } from "@/lib/jobs/bullmqBackend";
import type { JobView } from "@/lib/service/jobs";
import { redisUrl, startWorker, type WorkerProcess } from "./services";

const PREFIX = `ozte${process.pid}`;
let worker: WorkerProcess | null = null;

beforeAll(async () => {
  // always from the current source: a bundle left from older code would test that code
  execFileSync(process.execPath, ["scripts/engine-bundle.mjs"], { stdio: "inherit" });
  redisUrl();
  process.env.OZONE_QUEUE_PREFIX = PREFIX;
  worker = await startWorker({ OZONE_QUEUE_PREFIX: PREFIX, OZONE_WORKER_TASKS: "2", OZONE_QUEUE_LOCK_MS: "2000" });
});

afterAll(async () => {
  await worker?.stop();
  const { jobBackend } = await import("@/lib/service/jobs");
  await jobBackend().close();
  const { getStore } = await import("@/lib/store");
  await getStore().close();
});

/** Reads server-sent events until the stream ends. */
async function readEvents(res: Response): Promise<{ event: string; data: unknown }[]> {
  const text = await res.text();
  return text
    .split("\n\n")
    .filter((block) => block.trim())
    .map((block) => {
      const event = /^event: (.*)$/m.exec(block)?.[1] ?? "";
      const data = JSON.parse(/^data: (.*)$/m.exec(block)?.[1] ?? "null");
      return { event, data };
    });
}

describe("the service's jobs on the BullMQ back end", () => {
  it("is the back end the service picks when REDIS_URL is set", async () => {
    const { jobBackend } = await import("@/lib/service/jobs");
    expect(jobBackend()).toBeInstanceOf(BullmqJobBackend);
  });

  it("streams the job's status as server-sent events until it is done, ending with the result's links", async () => {
    const { jobEvents, startSweep, getJob } = await import("@/lib/service/jobs");
    const job = await startSweep({
      mechanismId: "reference",
      profile: { kind: "standard" },
      grid: { from_km: 20, to_km: 50, step_km: 3 },
    });
    expect(job.state).toBe("queued");
    expect(job.statusUrl).toBe(`/api/jobs/${job.id}`);
    const events = await readEvents(jobEvents(job.id, new AbortController().signal));
    expect(events.every((e) => e.event === "status")).toBe(true);
    const views = events.map((e) => e.data as JobView);
    const last = views.at(-1) as JobView;
    expect(last.state).toBe("done");
    expect(last.done).toBe(11);
    expect(last.total).toBe(11);
    expect(last.resultUrl).toBe(`/profiles/${last.resultId}`);
    expect(last.resultApiUrl).toBe(`/api/profiles/${last.resultId}`);
    expect(views.some((v) => v.state === "running")).toBe(true);
    // polling (what the progress bar does) reads the same view
    expect(await getJob(job.id)).toEqual(last);
    const { getProfileRecord } = await import("@/lib/service/profiles");
    const record = await getProfileRecord(last.resultId as string);
    expect(record.body.result.levels.length).toBe(11);
  });

  it("answers an unknown job id with a not-found event, and refuses a malformed one", async () => {
    const { jobEvents, getJob } = await import("@/lib/service/jobs");
    const events = await readEvents(jobEvents("AAAAAAAAAAAAAAAA", new AbortController().signal));
    expect(events).toEqual([
      { event: "error", data: { code: "not-found", message: "no job with id AAAAAAAAAAAAAAAA" } },
    ]);
    await expect(getJob("AAAAAAAAAAAAAAAA")).rejects.toThrow(/AAAAAAAAAAAAAAAA/);
    expect(() => jobEvents("bad id", new AbortController().signal)).toThrow();
  });
});
