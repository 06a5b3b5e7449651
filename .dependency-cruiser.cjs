/**
 * Dependency rules of lib/ (dependency-cruiser; `npm run deps`, part of `npm test`).
 * See DEVELOPERS.md, "Rules that keep this shape". Each layer may import its own
 * and lower layers only; a new import circle or an upward import fails the gate.
 */
const LAYERS = [
  ["base", "^lib/(errors\\.ts|caution\\.ts|idRecord\\.ts|csv/|mechanisms/|random/|store/|jobs/)"],
  ["mechanism", "^lib/(mechanism|kinetics)/"],
  ["atmosphere", "^lib/atmosphere/"],
  ["photolysis", "^lib/photolysis/"],
  ["solver", "^lib/solver/"],
  ["analysis", "^lib/analysis/"],
  ["uncertainty", "^lib/uncertainty/"],
  // the composition of one analysis
  ["engine", "^lib/engine/"],
  ["viz", "^lib/viz/"],
  ["profiles", "^lib/profiles/"],
  ["assessment", "^lib/assessment/"],
  // runs over days (at a place or along a trajectory), their daily budgets
  ["runs", "^lib/runs/"],
  // the worker-thread runtime: the task table of every kind of engine task (profile levels, Monte Carlo
  // samples, run days), the pool of worker threads that runs it, the health report
  ["runtime", "^lib/runtime/"],
  ["service", "^lib/service/"],
  // the queue worker's process (scripts/worker.mjs bundles it): the service's job handlers on the engine pool
  ["worker", "^lib/worker/"],
  // the command line (bin/ozone-cycles.cjs): the engine and the service's store-free parts, in one process
  // the typed client of the routes (its types come from the layers below, the service's included)
  ["client", "^lib/client/"],
  ["cli", "^lib/cli/"],
];

const upward = LAYERS.slice(0, -1).map(([name, path], i) => ({
  name: `no-upward-from-${name}`,
  comment: `lib layer "${name}" imports a higher layer (${LAYERS.slice(i + 1)
    .map(([n]) => n)
    .join(", ")}); move the shared code down or the importer up (DEVELOPERS.md)`,
  severity: "error",
  from: { path },
  to: { path: LAYERS.slice(i + 1).map(([, p]) => p) },
}));

module.exports = {
  forbidden: [
    {
      name: "no-circular",
      comment: "an import circle: split out the part both files need (DEVELOPERS.md)",
      severity: "error",
      from: {},
      to: { circular: true },
    },
    {
      name: "lib-not-app-or-components",
      comment: "lib/ never imports app/ or components/",
      severity: "error",
      from: { path: "^lib/" },
      to: { path: "^(app|components)/" },
    },
    {
      name: "lib-unlayered",
      comment: "a new lib/ folder: give it a layer in .dependency-cruiser.cjs and DEVELOPERS.md",
      severity: "error",
      from: { path: "^lib/", pathNot: LAYERS.map(([, p]) => p) },
      to: {},
    },
    ...upward,
  ],
  options: {
    doNotFollow: { path: "node_modules" },
    exclude: { path: "^(node_modules|\\.next|\\.engine)/" },
    // TypeScript 7 has no compiler API for dependency-cruiser; @swc/core parses (.ts only, so lib/)
    parser: "swc",
    tsPreCompilationDeps: true,
    tsConfig: { fileName: "tsconfig.json" },
    enhancedResolveOptions: {
      exportsFields: ["exports"],
      conditionNames: ["import", "require", "node", "default", "types"],
      extensions: [".ts", ".tsx", ".js", ".mjs", ".json"],
    },
  },
};
