import { describe, expect, it, vi } from "vitest";
import type { JobBackend, JobState, JobStatus } from "@/lib/jobs/types";
import { jobLimitFromEnv, memoryLedger, submitWithinLimit } from "@/lib/service/jobLimit";

vi.mock("server-only", () => ({}));

/** A job back end whose jobs stay in the state the test sets. */
function fakeBackend() {
  const states = new Map<string, JobState>();
  let n = 0;
  const status = (id: string) => ({ id, state: states.get(id) }) as unknown as JobStatus;
  const backend = {
    async submit() {
      const id = `job${++n}`;
      states.set(id, "running");
      return status(id);
    },
    async status(id: string) {
      return states.has(id) ? status(id) : null;
    },
  } as unknown as JobBackend;
  return { backend, states };
}

describe("the limit of jobs per client", () => {
  it("refuses the job beyond the limit with 429, counts other clients apart, and frees a slot when a job ends", async () => {
    const { backend, states } = fakeBackend();
    const ledger = memoryLedger();
    const submit = (client: string) => submitWithinLimit(ledger, backend, client, 2, () => backend.submit("x", {}));
    const a = await submit("198.51.100.1");
    await submit("198.51.100.1");
    await expect(submit("198.51.100.1")).rejects.toMatchObject({ status: 429, code: "too-many-jobs" });
    await expect(submit("198.51.100.2")).resolves.toBeTruthy();
    states.set(a.id, "done");
    await expect(submit("198.51.100.1")).resolves.toBeTruthy();
    expect((await ledger.ids("198.51.100.1")).length).toBe(2);
  });

  it("reads OZONE_JOBS_PER_CLIENT, default 40, and refuses a bad value", () => {
    expect(jobLimitFromEnv({})).toBe(40);
    expect(jobLimitFromEnv({ OZONE_JOBS_PER_CLIENT: "3" })).toBe(3);
    expect(() => jobLimitFromEnv({ OZONE_JOBS_PER_CLIENT: "0" })).toThrow(/OZONE_JOBS_PER_CLIENT/);
  });
});
