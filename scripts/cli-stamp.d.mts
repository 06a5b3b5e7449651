/** Types of scripts/cli-stamp.mjs (the launcher's stat-only check of the command line's bundles). */
export declare const STAMP_FILE: string;
export declare function stampedCliBundles(root: string): { cli: string; worker: string } | null;
export declare function cliBundlePaths(
  dir: string,
  key: string,
): { cli: string; worker: string; storedJson: string; codeCache: string };
