/**
 * Standard normal draws for Monte Carlo sample `index` of a run seeded by
 * `seed`: a per-sample stream of mulberry32 (Tommy Ettinger, 2017, public
 * domain; lib/random) seeded by MurmurHash3's fmix32 mixing of the seed
 * and the index (lib/random variantSeed), turned into normals by the
 * Box–Muller transform (Box & Muller, Ann. Math. Stat. 29, 610–611, 1958),
 * both of each pair used. Sample i's draws depend only on (seed, i), so a
 * run split into any batches gives the same samples.
 */
import { mulberry32, variantSeed } from "../random";

export function normalDraws(seed: number, index: number, count: number): Float64Array {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`normalDraws: invalid sample index ${index}`);
  const next = mulberry32(variantSeed(seed, index + 1));
  const z = new Float64Array(count);
  for (let i = 0; i < count; i += 2) {
    const u1 = 1 - next(); // (0, 1]: ln is finite
    const u2 = next();
    const radius = Math.sqrt(-2 * Math.log(u1));
    z[i] = radius * Math.cos(2 * Math.PI * u2);
    if (i + 1 < count) z[i + 1] = radius * Math.sin(2 * Math.PI * u2);
  }
  return z;
}
