/**
 * Interpolation in a node table (x increasing): log-linear (for cross
 * sections; linear where a node is 0) or linear (for yields, ratios,
 * irradiance). Outside the table: 0, or the end value when `clamp` is set.
 */

export type Nodes = ReadonlyArray<readonly [number, number]>;

export interface InterpolateOptions {
  /** "log" (default) or "linear" */
  mode?: "log" | "linear";
  /** hold the end values outside the table instead of returning 0; default false */
  clamp?: boolean;
}

export function interpolateNodes(nodes: Nodes, x: number, options: InterpolateOptions = {}): number {
  const n = nodes.length;
  if (x < nodes[0][0]) return options.clamp ? nodes[0][1] : 0;
  if (x > nodes[n - 1][0]) return options.clamp ? nodes[n - 1][1] : 0;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (nodes[mid][0] <= x) lo = mid;
    else hi = mid;
  }
  const [x0, y0] = nodes[lo];
  const [x1, y1] = nodes[hi];
  const f = x1 === x0 ? 0 : (x - x0) / (x1 - x0);
  if (options.mode === "linear" || y0 <= 0 || y1 <= 0) return y0 + (y1 - y0) * f;
  return Math.exp(Math.log(y0) + (Math.log(y1) - Math.log(y0)) * f);
}
