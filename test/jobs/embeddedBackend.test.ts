import { describe, expect, it } from "vitest";
import { EngineError, InputError } from "@/lib/errors";
import { EmbeddedJobBackend } from "@/lib/jobs/embeddedBackend";
import type { JobContext, JobStatus } from "@/lib/jobs/types";

const until = async (backend: EmbeddedJobBackend, id: string, states: string[]): Promise<JobStatus> => {
  for (let i = 0; i < 500; i++) {
    const s = await backend.status(id);
    if (s && states.includes(s.state)) return s;
    await new Promise((r) => setTimeout(r, 2));
  }
  throw new Error(`job ${id} never reached ${states.join("/")}`);
};

/** A handler that does `steps` units of work, each waiting for `gate` to open. */
function stepping(steps: number) {
  let open: () => void = () => {};
  let gate = new Promise<void>((r) => (open = r));
  const handler = async (input: { tag: string }, ctx: JobContext) => {
    for (let i = 0; i < steps; i++) {
      await gate;
      if (ctx.signal.aborted) throw ctx.signal.reason;
      ctx.progress(i + 1, steps, `step ${i + 1}`);
    }
    return { resultId: `result-${input.tag}`, resultKind: "test" };
  };
  return {
    handler,
    release: () => {
      open();
      gate = new Promise<void>((r) => (open = r));
    },
    openAll: () => {
      open();
      gate = Promise.resolve();
    },
  };
}

describe("EmbeddedJobBackend", () => {
  it("runs a job to done with its progress and result id", async () => {
    const work = stepping(3);
    const backend = new EmbeddedJobBackend({ work: work.handler as never });
    const queued = await backend.submit("work", { tag: "x" });
    expect(queued.state).toBe("queued");
    expect(queued.id).toMatch(/^[A-Za-z0-9_-]{16}$/);
    const seen: JobStatus[] = [];
    backend.watch(queued.id, (s) => seen.push(s));
    await until(backend, queued.id, ["running"]);
    work.release();
    await new Promise((r) => setTimeout(r, 5));
    const mid = await backend.status(queued.id);
    expect(mid?.done).toBe(1);
    expect(mid?.total).toBe(3);
    expect(mid?.stage).toBe("step 1");
    work.openAll();
    const done = await until(backend, queued.id, ["done"]);
    expect(done.resultId).toBe("result-x");
    expect(done.resultKind).toBe("test");
    // the watcher gets the state at subscription first, then every change
    expect(["queued", "running"]).toContain(seen[0].state);
    expect(seen.some((s) => s.state === "running" && s.done === 1)).toBe(true);
    expect(seen[seen.length - 1].state).toBe("done");
  });

  it("hands the handler a JSON copy of the input, as a queue in another process would", async () => {
    let got: unknown;
    const backend = new EmbeddedJobBackend({
      echo: (async (input: unknown) => {
        got = input;
        return { resultId: "r", resultKind: "test" };
      }) as never,
    });
    const input = { a: 1, nested: { b: [1, 2] } };
    const s = await backend.submit("echo", input);
    await until(backend, s.id, ["done"]);
    expect(got).toEqual(input);
    expect(got).not.toBe(input);
  });

  it("reports a handler's error with its code, message and path as a failed job", async () => {
    const backend = new EmbeddedJobBackend({
      bad: (async () => {
        throw new InputError("profile.csv row 3", "oops");
      }) as never,
      crash: (async () => {
        throw new TypeError("undefined is not a function");
      }) as never,
    });
    const a = await backend.submit("bad", {});
    const failed = await until(backend, a.id, ["failed"]);
    expect(failed.error).toEqual({
      code: "invalid-input",
      message: "profile.csv row 3: oops",
      path: "profile.csv row 3",
    });
    const b = await backend.submit("crash", {});
    const crashed = await until(backend, b.id, ["failed"]);
    // internal errors are not shown to users
    expect(crashed.error?.code).toBe("internal");
    expect(crashed.error?.message).not.toContain("undefined is not a function");
  });

  it("cancels a running job through its signal and a queued one before it starts", async () => {
    const work = stepping(100);
    const backend = new EmbeddedJobBackend({ work: work.handler as never }, { concurrency: 1 });
    const first = await backend.submit("work", { tag: "1" });
    const second = await backend.submit("work", { tag: "2" });
    await until(backend, first.id, ["running"]);
    expect((await backend.status(second.id))?.state).toBe("queued");
    expect((await backend.cancel(second.id))?.state).toBe("cancelled");
    expect((await backend.cancel(first.id))?.state).toBe("cancelled");
    work.openAll();
    await new Promise((r) => setTimeout(r, 10));
    const s1 = await backend.status(first.id);
    expect(s1?.state).toBe("cancelled");
    expect(s1?.resultId).toBeUndefined();
    expect((await backend.status(second.id))?.state).toBe("cancelled");
  });

  it("runs at most `concurrency` jobs at once", async () => {
    const work = stepping(1);
    const backend = new EmbeddedJobBackend({ work: work.handler as never }, { concurrency: 2 });
    const ids = await Promise.all([1, 2, 3].map((i) => backend.submit("work", { tag: String(i) })));
    await until(backend, ids[1].id, ["running"]);
    const states = await Promise.all(ids.map(async (s) => (await backend.status(s.id))?.state));
    expect(states).toEqual(["running", "running", "queued"]);
    work.openAll();
    for (const s of ids) await until(backend, s.id, ["done"]);
  });

  it("throws for an unknown job kind and returns null for an unknown id", async () => {
    const backend = new EmbeddedJobBackend({});
    await expect(backend.submit("nope", {})).rejects.toThrow(EngineError);
    expect(await backend.status("AAAAAAAAAAAAAAAA")).toBeNull();
    expect(await backend.cancel("AAAAAAAAAAAAAAAA")).toBeNull();
  });
});
