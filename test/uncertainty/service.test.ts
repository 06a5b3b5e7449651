/**
 * The uncertainty jobs of the service, with the engine pool replaced by the
 * same jobs run in this thread (runJob) and the store in a temporary folder:
 * batching, progress, storage and failed levels, not the worker threads.
 */
import { describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  // hoisted above the imports, so the store opens in a fresh folder
  const fs = require("node:fs");
  const os = require("node:os");
  process.env.OZONE_DATA_DIR = fs.mkdtempSync(`${os.tmpdir()}/ozone-unc-`);
  delete process.env.DATABASE_URL;
});
vi.mock("server-only", () => ({}));
vi.mock("@/lib/runtime/pool", async () => {
  const { runJob } = await import("@/lib/runtime/taskTable");
  // yield to the event loop before each job, as a real worker round trip does
  const pool = {
    run: async (job: Parameters<typeof runJob>[0]) => {
      await new Promise((r) => setImmediate(r));
      return runJob(job);
    },
  };
  return { enginePool: () => pool, POOL_DEFAULTS: { size: 2, timeout_ms: 30_000, script: "" } };
});

import { solveConditionsOf } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { getAnalysisRecord } from "@/lib/service/analyses";
import { getUncertaintyProfile } from "@/lib/service/uncertainty";
import { cancelUncertaintyJob, getUncertaintyJob, startUncertaintyJob } from "@/lib/service/uncertaintyJobs";
import { getStore, newRecordId } from "@/lib/store";
import { monteCarlo } from "@/lib/uncertainty";
import { expectClose } from "../helpers/close";

async function finished(id: string) {
  for (let i = 0; i < 600; i++) {
    const s = await getUncertaintyJob(id);
    if (s.state === "done" || s.state === "failed" || s.state === "cancelled") return s;
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error("job did not finish");
}

/** The same Monte Carlo in this thread: central analysis of the request, then its samples with the given seed. */
function inThread(request: { mechanismId: string; condition: { altitude_km: number } }, samples: number, seed: number) {
  const mech = loadBuiltinMechanism(request.mechanismId).mechanism;
  const c = runAnalysis(mech, { id: request.mechanismId, title: mech.title }, { ...request, options: {} });
  const mc = monteCarlo(
    mech,
    solveConditionsOf(c.condition),
    c.steadyState,
    c.cycles,
    { fminRelative: 1e-4, oxDefinition: "standard", heldSpecies: Object.keys(c.condition.held_cm3) },
    { samples, seed },
  );
  return { condition: c.condition, mc };
}

const analysis = {
  mechanismId: "oxygen-chlorine",
  condition: { altitude_km: 40 },
  options: { uncertaintySamples: 120, uncertaintySeed: 3, sensitivity: true },
};

describe("uncertainty jobs", () => {
  it("run one analysis's samples in batches, report progress to the end and store the ranges with the analysis", async () => {
    const job = await startUncertaintyJob({ analysis });
    expect(job.statusUrl).toBe(`/api/uncertainty/jobs/${job.id}`);
    const s = await finished(job.id);
    expect(s.state).toBe("done");
    expect(s.done).toBe(121);
    expect(s.total).toBe(121);
    expect(s.resultApiUrl).toBe(`/api/analyses/${s.resultId}`);
    const record = await getAnalysisRecord(s.resultId as string);
    const mc = record.result.uncertainty?.monteCarlo;
    expect(mc?.samples).toBe(120);
    expect(record.result.uncertainty?.sensitivity?.status).toBe("ok");
    expect(record.request.options?.uncertaintySamples).toBe(120);
    // the same seed in one thread gives the same ranges as the batches
    expect(mc?.summaries).toEqual(inThread(analysis, 120, 3).mc.summaries);
  });

  it("solve every sample with the condition's aerosol surface, as the central analysis does", async () => {
    const volcanic = {
      mechanismId: "reference",
      condition: { altitude_km: 20, aerosolSurface_um2cm3: 20 },
      options: { uncertaintySamples: 12, uncertaintySeed: 5 },
    };
    const s = await finished((await startUncertaintyJob({ analysis: volcanic })).id);
    expect(s.state).toBe("done");
    const mc = (await getAnalysisRecord(s.resultId as string)).result.uncertainty?.monteCarlo;
    const direct = inThread(volcanic, 12, 5);
    // 20 µm² cm⁻³ = 20 × 10⁻⁸ cm² cm⁻³ (unit conversion)
    expectClose(
      solveConditionsOf(direct.condition).aerosolSurface_cm2cm3 as number,
      20e-8,
      { rel: 1e-12 },
      "aerosol surface",
    );
    expect(mc?.failed).toBe(0);
    expect(mc?.summaries).toEqual(direct.mc.summaries);
  });

  it("run every level of a stored sweep and keep a level that did not converge as such", async () => {
    const levels = [35, 40].map((z) => ({
      altitude_km: z,
      status: "converged",
      message: "",
      request: { mechanismId: "oxygen-chlorine", condition: { altitude_km: z } },
    }));
    levels.push({ ...levels[0], altitude_km: 45, status: "max-iterations", message: "stopped" });
    const profileId = newRecordId();
    await getStore().putRecord({
      id: profileId,
      kind: "profile",
      engineVersion: "test",
      body: { request: { mechanismId: "oxygen-chlorine" }, profile: {}, result: { levels } },
      createdAt: new Date().toISOString(),
    });
    const s = await finished((await startUncertaintyJob({ profileId, samples: 6, seed: 2 })).id);
    expect(s.state).toBe("done");
    // progress counts the central solve and the samples of each converged level
    expect(s.total).toBe(2 * (6 + 1));
    expect(s.done).toBe(s.total);
    const rec = await getUncertaintyProfile(s.resultId as string);
    expect(rec.body.levels.map((l) => l.status)).toEqual(["ok", "ok", "max-iterations"]);
    expect(rec.body.levels[2].monteCarlo).toBeNull();
    expect(rec.body.levels[0].monteCarlo?.samples).toBe(6);
    const clox = rec.body.bands.find((b) => b.family === "ClOx");
    expect(clox?.points.map((p) => p.p05 === null)).toEqual([false, false, true]);
  });

  it("stop between batches when cancelled and store nothing", async () => {
    const job = await startUncertaintyJob({ analysis: { ...analysis, options: { uncertaintySamples: 5000 } } });
    await new Promise((r) => setTimeout(r, 50));
    await cancelUncertaintyJob(job.id);
    const s = await finished(job.id);
    expect(s.state).toBe("cancelled");
    expect(s.resultId).toBeUndefined();
    expect(s.done).toBeLessThan(5001);
  });

  it("throws if the body is invalid or names what does not exist, before anything is queued", async () => {
    await expect(
      startUncertaintyJob({ analysis: { ...analysis, options: { uncertaintySamples: 1.5 } } }),
    ).rejects.toThrow(InputError);
    await expect(startUncertaintyJob({ profileId: "nope", samples: 3 })).rejects.toThrow(/profile/);
    await expect(startUncertaintyJob({ analysis: { ...analysis, mechanismId: "nothing" } })).rejects.toThrow(
      /mechanism/,
    );
    await expect(getUncertaintyJob("AAAAAAAAAAAAAAAA")).rejects.toThrow(/no uncertainty job/);
  });
});
