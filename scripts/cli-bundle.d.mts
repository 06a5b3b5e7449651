/** Types of scripts/cli-bundle.mjs (the command line's bundles and their key). */
export interface SourceStamp {
  key: string;
  files: [string, number, number][];
  dirs: [string, number][];
}
export declare function sourceKey(root: string): { key: string; stamp: SourceStamp };
export declare function writeStamp(dir: string, stamp: SourceStamp): void;
export declare function ensureCliBundles(root: string): Promise<{ cli: string; worker: string }>;
