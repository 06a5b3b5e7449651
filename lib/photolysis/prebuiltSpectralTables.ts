/**
 * Spectral tables computed ahead of time, or undefined. Here they never are, so the engine builds them when
 * it loads (spectralTables.ts, about 0.3 s of CPU). A bundle that can keep them between runs, the command
 * line's (scripts/cli-bundle.mjs), replaces this module with one that returns the tables it stored: V8's
 * serialised form (node:v8), whose Float64Arrays come back bit for bit.
 */
export function prebuiltSpectralTables(): unknown {
  return undefined;
}
