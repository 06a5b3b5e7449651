/**
 * Logarithmic scale for positive rates: maps [lo, hi] to [0, 1] by log10,
 * with hi the largest value and lo at most `decades` decades below it
 * (common practice for spanning reaction fluxes that differ by orders of
 * magnitude). Values at or below lo map to 0; non-positive values too.
 */
import { formatDecade } from "./formatNumber";

export const LOG_SCALE_DEFAULTS = {
  /** decades shown below the largest value; default 8 */
  decades: 8,
};

export interface LogScale {
  /** lower end, same unit as the values */
  lo: number;
  /** upper end */
  hi: number;
  normalize(v: number): number;
  /** ticks at whole decades, offset 0–1 and a label such as "10⁶" */
  ticks(maxTicks?: number): { offset: number; value: number; label: string }[];
}

export function logScale(values: readonly number[], options: Partial<typeof LOG_SCALE_DEFAULTS> = {}): LogScale {
  const { decades } = { ...LOG_SCALE_DEFAULTS, ...options };
  if (!(decades > 0)) throw new RangeError(`logScale: invalid decades: ${decades}`);
  const pos = values.filter((v) => Number.isFinite(v) && v > 0);
  const max = pos.length ? Math.max(...pos) : 1;
  const min = pos.length ? Math.min(...pos) : 1;
  const hiExp = Math.ceil(Math.log10(max));
  const loExp = Math.max(Math.floor(Math.log10(min)), hiExp - decades);
  const lo = 10 ** (loExp === hiExp ? hiExp - 1 : loExp);
  const hi = 10 ** hiExp;
  const span = Math.log10(hi) - Math.log10(lo);
  const normalize = (v: number): number => {
    if (!(Number.isFinite(v) && v > lo)) return 0;
    return Math.min(1, (Math.log10(v) - Math.log10(lo)) / span);
  };
  const ticks = (maxTicks = 6) => {
    const a = Math.round(Math.log10(lo));
    const b = Math.round(Math.log10(hi));
    const step = Math.max(1, Math.ceil((b - a) / Math.max(1, maxTicks - 1)));
    const out: { offset: number; value: number; label: string }[] = [];
    for (let e = b; e >= a; e -= step)
      out.unshift({ offset: (e - a) / (b - a), value: 10 ** e, label: formatDecade(e) });
    return out;
  };
  return { lo, hi, normalize, ticks };
}
