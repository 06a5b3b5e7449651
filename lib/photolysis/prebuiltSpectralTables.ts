/**
 * Spectral tables computed ahead of time, or undefined. Here they never are, so the engine builds them when
 * it loads (spectralTables.ts, about 0.3 s of CPU). A bundle that can keep them between runs, the command
 * line's (scripts/cli-bundle.mjs), replaces this module with one that returns the tables it stored: plain
 * JSON, every Float64Array as its numbers, which JSON gives back bit for bit.
 */
export function prebuiltSpectralTables(): unknown {
  return undefined;
}
