// `node bench/trace-first-load.mjs`: what the long tasks of the explorer's
// first load are made of. Opens /explore on the built-in reference mechanism
// (or on an uploaded generated network, TRACE_SIZE=2000) in Chromium with a
// performance trace (devtools.timeline and the V8 sampling profiler), then
// prints every main-thread task over TRACE_MIN_MS (default 50) with what the
// browser did in it (script, style, layout, paint, garbage collection) and
// where its script time went: the samples are mapped through the build's
// source maps, when it has them (NEXT_BROWSER_SOURCE_MAPS=1 npm run build), to
// the innermost function of this repository's own code on the stack and to the
// package the sampled function is in. No pass/fail: a diagnosis aid.
//
// Needs a started server, like bench:large: TRACE_URL=http://127.0.0.1:3250,
// and TRACE_DIST (default .next) the build folder of that server for the maps.
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { chromium } from "@playwright/test";
import { loadOpenNetwork } from "./loadOpenNetwork.mjs";

const base = process.env.TRACE_URL ?? "http://127.0.0.1:3000";
const size = process.env.TRACE_SIZE ?? "reference";
const minMs = Number(process.env.TRACE_MIN_MS ?? 50);
const dist = process.env.TRACE_DIST ?? ".next";

const { TraceMap, originalPositionFor } = await import("@jridgewell/trace-mapping");

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
});
const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
const page = await context.newPage();
let id = "reference";
if (size !== "reference") {
  const openNetwork = await loadOpenNetwork();
  const n = Number(size);
  const up = await page.request.post(`${base}/api/mechanisms`, {
    headers: { "content-type": "application/json" },
    data: openNetwork(n, 4 * n, { ozone: true }),
    timeout: 120_000,
  });
  if (!up.ok()) throw new Error(`upload: ${up.status()} ${await up.text()}`);
  id = (await up.json()).id;
}
await browser.startTracing(page, {
  categories: [
    "devtools.timeline",
    "disabled-by-default-devtools.timeline",
    "v8.execute",
    "disabled-by-default-v8.cpu_profiler",
    "blink.user_timing",
  ],
});
await page.goto(`${base}/explore?m=${id}&z=30`);
await page.waitForFunction(
  () => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"),
  null,
  { timeout: 180_000 },
);
await page.waitForSelector('[data-testid="network"][data-ready="true"]');
await page.waitForTimeout(1500);
const trace = JSON.parse((await browser.stopTracing()).toString());
await browser.close();

const events = trace.traceEvents ?? trace;
const mains = events.filter((e) => e.ph === "M" && e.name === "thread_name" && e.args?.name === "CrRendererMain");
const key = (e) => `${e.pid}:${e.tid}`;
const runTasks = new Map();
for (const e of events)
  if (e.name === "RunTask" && e.ph === "X") runTasks.set(key(e), (runTasks.get(key(e)) ?? 0) + e.dur);
const main = mains.map(key).sort((a, b) => (runTasks.get(b) ?? 0) - (runTasks.get(a) ?? 0))[0];
const onMain = events.filter((e) => key(e) === main && e.ph === "X").sort((a, b) => a.ts - b.ts);
const tasks = onMain.filter((e) => e.name === "RunTask" && e.dur / 1000 > minMs);

// the CPU profile: samples with their times
const samples = [];
const nodes = new Map();
let profileStart = null;
let t = 0;
for (const e of events) {
  if (e.name === "Profile" && key(e) === main) profileStart = e.args.data.startTime;
}
for (const e of events.filter((x) => x.name === "ProfileChunk" && x.pid === Number(main.split(":")[0]))) {
  const d = e.args.data;
  for (const n of d.cpuProfile?.nodes ?? []) nodes.set(n.id, n);
  const ids = d.cpuProfile?.samples ?? [];
  const deltas = d.timeDeltas ?? [];
  for (let i = 0; i < ids.length; i++) {
    t += deltas[i] ?? 0;
    samples.push({ ts: (profileStart ?? 0) + t, id: ids[i] });
  }
}

let parentCache = null;
const maps = new Map();
function original(cf) {
  const m = /\/_next\/(static\/.*\.js)/.exec(cf.url ?? "");
  if (!m) return null;
  const file = path.join(dist, m[1]);
  if (!maps.has(file)) {
    // the chunk names its map on its last line
    const ref = existsSync(file) ? /sourceMappingURL=(\S+)\s*$/.exec(readFileSync(file, "utf8")) : null;
    const mapFile = ref ? path.join(path.dirname(file), ref[1]) : `${file}.map`;
    maps.set(file, existsSync(mapFile) ? new TraceMap(readFileSync(mapFile, "utf8")) : null);
  }
  const tm = maps.get(file);
  if (!tm) return null;
  const p = originalPositionFor(tm, { line: cf.lineNumber + 1, column: cf.columnNumber });
  return p.source
    ? { source: p.source.replace(/^.*?(node_modules\/|components\/|lib\/|app\/)/, "$1"), name: p.name, line: p.line }
    : null;
}
const memo = new Map();
function frameLabel(nodeId) {
  if (memo.has(nodeId)) return memo.get(nodeId);
  const n = nodes.get(nodeId);
  const cf = n.callFrame;
  const o = original(cf);
  const label = {
    fn: cf.functionName || "(anonymous)",
    source: o?.source ?? (cf.url ?? "").split("/").pop(),
    line: o?.line,
  };
  memo.set(nodeId, label);
  return label;
}
const pkg = (source) => {
  const m = /node_modules\/((@[^/]+\/)?[^/]+)/.exec(source);
  return m ? m[1] : source;
};

for (const task of tasks) {
  const end = task.ts + task.dur;
  const inside = onMain.filter((e) => e.ts >= task.ts && e.ts + e.dur <= end && e !== task);
  const byName = new Map();
  for (const e of inside) {
    if (
      !/^(FunctionCall|TimerFire|EvaluateScript|v8\.compile|ParseHTML|UpdateLayoutTree|Layout|Paint|PrePaint|Layerize|MajorGC|MinorGC|RunMicrotasks|FireAnimationFrame|HitTest|ParseAuthorStyleSheet|XHRLoad|EventDispatch|v8\.run)$/.test(
        e.name,
      )
    )
      continue;
    byName.set(e.name, (byName.get(e.name) ?? 0) + e.dur / 1000);
  }
  const own = new Map();
  const leaf = new Map();
  const callee = new Map();
  const leafFn = new Map();
  let n = 0;
  for (const s of samples) {
    if (s.ts < task.ts || s.ts > end) continue;
    const node = nodes.get(s.id);
    if (!node) continue;
    n++;
    const l = frameLabel(s.id);
    const lk = l.fn === "(program)" || l.fn === "(garbage collector)" || l.fn === "(idle)" ? l.fn : pkg(l.source);
    leaf.set(lk, (leaf.get(lk) ?? 0) + 1);
    const fk = `${pkg(l.source)}:${l.line} ${l.fn}`;
    leafFn.set(fk, (leafFn.get(fk) ?? 0) + 1);
    // innermost own frame: walk up by parent links
    let cur = s.id;
    let ownKey = "(no own frame)";
    let below = null;
    const parents = parentOf();
    while (cur !== undefined) {
      const fl = frameLabel(cur);
      if (/^(components|lib|app)\//.test(fl.source)) {
        ownKey = `${fl.source}:${fl.line} ${fl.fn}`;
        break;
      }
      below = cur;
      cur = parents.get(cur);
    }
    own.set(ownKey, (own.get(ownKey) ?? 0) + 1);
    if (below !== null && ownKey !== "(no own frame)") {
      const b = frameLabel(below);
      const ck = `${ownKey.split(" ")[0]} → ${pkg(b.source)}:${b.line} ${b.fn}`;
      callee.set(ck, (callee.get(ck) ?? 0) + 1);
    }
  }
  const per = n ? task.dur / 1000 / n : 0;
  const fmt = (m) =>
    [...m]
      .sort((a, b) => b[1] - a[1])
      .slice(0, 10)
      .map(([k, v]) => `      ${(v * per).toFixed(0).padStart(5)} ms  ${k}`)
      .join("\n");
  console.log(`task at ${((task.ts - onMain[0].ts) / 1000).toFixed(0)} ms: ${(task.dur / 1000).toFixed(0)} ms`);
  console.log(
    `   events: ${[...byName]
      .sort((a, b) => b[1] - a[1])
      .map(([k, v]) => `${k} ${v.toFixed(0)}`)
      .join(", ")}`,
  );
  console.log(`   innermost own frame (${n} samples):\n${fmt(own)}`);
  console.log(`   sampled function's package:\n${fmt(leaf)}`);
  if (process.env.TRACE_FUNCTIONS) console.log(`   sampled functions:\n${fmt(leafFn)}`);
  if (callee.size) console.log(`   what the own frame called:\n${fmt(callee)}`);
}

function parentOf() {
  if (parentCache) return parentCache;
  parentCache = new Map();
  for (const n of nodes.values()) for (const c of n.children ?? []) parentCache.set(c, n.id);
  for (const n of nodes.values()) if (n.parent !== undefined) parentCache.set(n.id, n.parent);
  return parentCache;
}
