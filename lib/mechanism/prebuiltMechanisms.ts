/**
 * The built-in mechanisms loaded ahead of time, by id, or undefined. Here they never are, so each is read and
 * parsed from lib/mechanisms/<id>.yaml on first use (the reference document's YAML alone takes about 0.15 s).
 * A bundle that can keep them between runs, the command line's (scripts/cli-bundle.mjs), replaces this
 * module with one that returns them as the JSON of each LoadedMechanism.
 */
export function prebuiltMechanisms(): unknown {
  return undefined;
}
