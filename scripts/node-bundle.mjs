// esbuild settings shared by the bundles that run lib/ in plain Node (the
// queue worker, the command line): ESM for node20, and the two shims below.

/** createRequire shim: bundled CommonJS dependencies call require. */
export const requireBanner = {
  js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);",
};

/** "server-only" guards modules against client bundles; in a plain Node process it has nothing to guard. */
export const serverOnlyStub = {
  name: "server-only",
  setup(b) {
    b.onResolve({ filter: /^server-only$/ }, () => ({ path: "server-only", namespace: "empty" }));
    b.onLoad({ filter: /.*/, namespace: "empty" }, () => ({ contents: "", loader: "js" }));
  },
};

export const NODE_BUNDLE = {
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  logLevel: "warning",
  banner: requireBanner,
};
