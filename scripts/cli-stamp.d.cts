/** Types of scripts/cli-stamp.cjs (the launcher's stat-only check of the command line's bundles). */
export declare const STAMP_FILE: string;
/** "v8 <version> <arch>": the runtime whose formats the stored files are in */
export declare const CLI_RUNTIME: string;
export declare function stampedCliBundles(root: string): { cli: string; worker: string } | null;
export declare function cliBundlePaths(
  dir: string,
  key: string,
): { cli: string; worker: string; storedJson: string; codeCache: string };
