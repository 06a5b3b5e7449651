/**
 * The wavelength grid computed ahead of time, or undefined. Here it never is, so the engine builds it when it
 * loads (wavelengthGrid.ts: ~2,400 interpolations of the solar spectrum, a few ms of a cold start). The command
 * line's bundle (scripts/cli-bundle.mjs) replaces this module with one that returns the grid it stored beside
 * the spectral tables (prebuiltSpectralTables.ts), in V8's serialised form, bit for bit.
 */
export function prebuiltWavelengthGrid(): unknown {
  return undefined;
}
