/**
 * A one-line progress bar redrawn in place on stderr, only when stderr is a
 * terminal: piped or redirected output never sees it.
 */
import type { CliIo } from "./io";

export const PROGRESS_DEFAULTS = {
  /** characters of the bar; default 30 */
  width: 30,
};

export interface ProgressBar {
  update(done: number, total: number, label: string): void;
  /** ends the line; a no-op when nothing was drawn */
  end(): void;
}

export function progressBar(io: CliIo, options: Partial<typeof PROGRESS_DEFAULTS> = {}): ProgressBar {
  const { width } = { ...PROGRESS_DEFAULTS, ...options };
  let drawn = false;
  if (!io.stderrIsTTY) return { update() {}, end() {} };
  return {
    update(done, total, label) {
      const f = total > 0 ? Math.min(1, done / total) : 0;
      const n = Math.round(f * width);
      io.stderr(`\r[${"#".repeat(n)}${"-".repeat(width - n)}] ${done}/${total} ${label}\x1b[K`);
      drawn = true;
    },
    end() {
      if (drawn) io.stderr("\n");
      drawn = false;
    },
  };
}
