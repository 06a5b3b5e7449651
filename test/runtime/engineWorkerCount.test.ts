/** OZONE_ENGINE_WORKERS: the engine pool's size, from the environment. */
import { availableParallelism } from "node:os";
import { describe, expect, it } from "vitest";
import { engineWorkerCount, MAX_ENGINE_WORKERS } from "@/lib/runtime/pool";

describe("engineWorkerCount", () => {
  it("is one worker a core when the variable is unset or empty", () => {
    expect(engineWorkerCount(undefined)).toBe(Math.max(1, availableParallelism()));
    expect(engineWorkerCount("")).toBe(Math.max(1, availableParallelism()));
  });

  it("takes a whole number from 1 to four a core", () => {
    expect(engineWorkerCount("1")).toBe(1);
    expect(engineWorkerCount("3")).toBe(3);
    expect(engineWorkerCount(String(MAX_ENGINE_WORKERS))).toBe(MAX_ENGINE_WORKERS);
  });

  it("refuses anything else, naming the value and the range", () => {
    for (const bad of ["0", "-2", "1.5", "1e3", "0x10", " 4 ", "four", String(MAX_ENGINE_WORKERS + 1)])
      expect(() => engineWorkerCount(bad), bad).toThrow(
        /invalid OZONE_ENGINE_WORKERS: ".*" \(expected a whole number from 1 to \d+\)/,
      );
  });
});
