/** The progress bar of lib/cli: drawn in place on a terminal, never on a pipe. */
import { describe, expect, it } from "vitest";
import type { CliIo } from "@/lib/cli";
import { progressBar } from "@/lib/cli/progressBar";

function io(tty: boolean): CliIo & { err: string[] } {
  const err: string[] = [];
  return { cwd: "/", stdout: () => {}, stderr: (s) => err.push(s), stderrIsTTY: tty, err };
}

describe("progressBar", () => {
  it("redraws one line on a terminal and ends it with a newline", () => {
    const t = io(true);
    const bar = progressBar(t, { width: 10 });
    bar.update(0, 4, "levels");
    bar.update(2, 4, "levels");
    bar.end();
    expect(t.err[1]).toBe("\r[#####-----] 2/4 levels\x1b[K");
    expect(t.err.at(-1)).toBe("\n");
  });

  it("writes nothing when stderr is not a terminal", () => {
    const t = io(false);
    const bar = progressBar(t);
    bar.update(1, 2, "levels");
    bar.end();
    expect(t.err).toEqual([]);
  });
});
