// A soak and fuzz run against a production server (not part of `npm test`):
//   node bench/soak.mjs [--minutes 10] [--fuzz 10000] [--port 3294] [--timeout-s 60]
// starts `scripts/serve.mjs` on the port with a temporary store (rate limits raised, so that the
// run measures the server and not the limiter), then
//   1. sends mixed requests for --minutes (analyses, uploads, reads, exports, deletions, sweeps,
//      malformed bodies) from 4 concurrent clients, sampling the server's RSS every 10 s;
//   2. sends --fuzz generated malformed requests and documents, counting every status.
// It prints the RSS trend, every status with its count, the 5xx, the responses that contain NaN, the
// requests that got no answer within --timeout-s (counted as "timeout", so that a hang cannot stall
// the run) and the slowest requests of each part with their bodies.
// Goal: 0 responses of 5xx, flat memory after warm-up, 0 NaN. Needs a build (`npm run build`).
import { readFileSync } from "node:fs";
import { startBenchServer } from "./server.mjs";

const arg = (name, d) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : d;
};
const MINUTES = arg("minutes", 10);
const FUZZ = arg("fuzz", 10_000);
const PORT = arg("port", 3294);
const TIMEOUT_MS = arg("timeout-s", 60) * 1000;
const base = `http://127.0.0.1:${PORT}`;

// seeded, so that a run can be repeated (mulberry32)
let seed = 20261203;
const rand = () => {
  seed = (seed + 0x6d2b79f5) | 0;
  let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
};
const pick = (xs) => xs[Math.floor(rand() * xs.length)];

const server = await startBenchServer(PORT, {
  OZONE_RATE_LIMIT: "100000000",
  OZONE_JOBS_PER_CLIENT: "1000",
});
const rss_MiB = () => {
  const m = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${server.proc.pid}/status`, "utf8"));
  return m ? Number(m[1]) / 1024 : Number.NaN;
};

const statuses = new Map();
const fiveHundreds = [];
const nans = [];
const timeouts = [];
/** the slowest requests so far, slowest first: { ms, label, url, body } */
let slowest = [];
const excerpt = (body) => JSON.stringify(String(body ?? "").slice(0, 160));
async function send(label, url, init = {}) {
  let status = "network-error";
  const t0 = performance.now();
  try {
    const r = await fetch(`${base}${url}`, { ...init, signal: AbortSignal.timeout(TIMEOUT_MS) });
    status = r.status;
    const text = await r.text();
    if (status >= 500) fiveHundreds.push(`${label}: ${status} ${text.slice(0, 160)}`);
    // a NaN the server computed, not one quoted back from a document that contained the word
    if (/\bNaN\b/.test(text) && !/\bNaN\b/.test(String(init.body ?? ""))) nans.push(`${label}: ${url}`);
    return { status, text };
  } catch (e) {
    if (e.name === "TimeoutError") {
      status = "timeout";
      timeouts.push(`${label}: ${init.method ?? "GET"} ${url} ${excerpt(init.body)}`);
    } else fiveHundreds.push(`${label}: ${e.message}`);
    return { status, text: "" };
  } finally {
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
    const ms = performance.now() - t0;
    if (slowest.length < 10 || ms > slowest[slowest.length - 1].ms) {
      slowest = [...slowest, { ms, label, url, body: excerpt(init.body), status }]
        .sort((a, b) => b.ms - a.ms)
        .slice(0, 10);
    }
  }
}
const printSlowest = (part) => {
  console.log(`${part}: the slowest requests`);
  for (const s of slowest) console.log(`  ${(s.ms / 1000).toFixed(1)} s  ${s.status}  ${s.label} ${s.url} ${s.body}`);
  slowest = [];
};
const json = (body) => ({ method: "POST", headers: { "content-type": "application/json" }, body });

const minimal = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8");
const stored = [];

async function mixedRequest() {
  const r = rand();
  if (r < 0.35) {
    const condition = { altitude_km: Math.round(15 + rand() * 40), zenith_deg: Math.round(rand() * 85) };
    const out = await send(
      "analysis",
      "/api/analyses?draft=1",
      json(JSON.stringify({ mechanismId: pick(["oxygen", "oxygen-chlorine", "reference"]), condition })),
    );
    if (out.status === 201) stored.push(JSON.parse(out.text));
  } else if (r < 0.5 && stored.length) {
    const a = pick(stored);
    await send("read", pick([`/api/analyses/${a.id}`, `/api/analyses/${a.id}/rates.csv`, `/a/${a.id}`]));
  } else if (r < 0.55 && stored.length) {
    const a = stored.splice(Math.floor(rand() * stored.length), 1)[0];
    await send("delete", `/api/analyses/${a.id}`, {
      method: "DELETE",
      headers: { "x-deletion-token": a.deletionToken },
    });
  } else if (r < 0.62) {
    await send(
      "upload",
      "/api/mechanisms",
      json(JSON.stringify({ text: minimal.replace("Chapman", `Soak ${rand()}`) })),
    );
  } else if (r < 0.64) {
    await send(
      "sweep",
      "/api/profiles",
      json(
        JSON.stringify({
          mechanismId: "oxygen",
          profile: { kind: "standard" },
          grid: { from_km: 30, to_km: 40, step_km: 5 },
        }),
      ),
    );
  } else if (r < 0.8) {
    await send("malformed", "/api/analyses", json(malformedBody()));
  } else {
    await send("page", pick(["/api/health", "/api/mechanisms", "/explore", "/api/openapi.json"]));
  }
}

function malformedBody() {
  const shapes = [
    () => "{",
    () => "[".repeat(1 + Math.floor(rand() * 10_000)),
    () => JSON.stringify({ mechanismId: "reference", condition: { altitude_km: pick([-1, 1e308, "x", null, 87]) } }),
    () =>
      JSON.stringify({
        mechanismId: "reference",
        condition: { altitude_km: 30, held: { __proto__: 1, [pick(["O3", "x", ""])]: pick([2, -1, "a"]) } },
      }),
    () =>
      JSON.stringify({
        mechanismId: pick(["", "../etc", "x".repeat(200), "m-0", "__proto__"]),
        condition: { altitude_km: 30 },
      }),
    () =>
      JSON.stringify({
        mechanismId: "reference",
        condition: { altitude_km: 30, T_K: pick([0, 1e9, Number.MAX_VALUE]) },
        extra: 1,
      }),
    () => String.fromCharCode(...Array.from({ length: 200 }, () => Math.floor(rand() * 256))),
    () =>
      JSON.stringify({
        mechanismId: "reference",
        condition: { altitude_km: 30, J: { [pick(["O3_O", "x"])]: pick([11, -1, 1e-3]) } },
      }),
  ];
  return pick(shapes)();
}

function malformedDocument() {
  const shapes = [
    () => `title: x\nversion: "1"\nspecies: ${"[".repeat(100 + Math.floor(rand() * 5000))}`,
    () => `${"- ".repeat(70 + Math.floor(rand() * 200))}x`,
    () => minimal.replace(/O3/g, pick(["O4", "", "Q", "O3 O3"])),
    () => minimal.replace("8.0e-12", pick(["-1", "NaN", "1e999", "x"])),
    () => minimal.slice(0, Math.floor(rand() * minimal.length)),
    () => JSON.stringify({ title: "x", version: "1", species: [], reactions: [] }),
    () => `a: &a [${"*a, ".repeat(50)}]`,
    () => String.fromCharCode(...Array.from({ length: 300 }, () => Math.floor(rand() * 256))),
  ];
  return pick(shapes)();
}

try {
  console.log(`soak: ${MINUTES} min of mixed requests from 4 clients, RSS every 10 s`);
  const samples = [];
  const t0 = Date.now();
  const sampler = setInterval(() => {
    const s = { t_s: Math.round((Date.now() - t0) / 1000), rss: rss_MiB() };
    samples.push(s);
    console.log(`  t = ${String(s.t_s).padStart(4)} s  RSS ${s.rss.toFixed(0)} MiB`);
  }, 10_000);
  let requests = 0;
  await Promise.all(
    Array.from({ length: 4 }, async () => {
      while (Date.now() - t0 < MINUTES * 60_000) {
        await mixedRequest();
        requests++;
      }
    }),
  );
  clearInterval(sampler);
  const warm = samples.filter((s) => s.t_s >= 60);
  const xs = warm.length >= 2 ? warm : samples;
  if (xs.length >= 2) {
    const n = xs.length;
    const mx = xs.reduce((a, s) => a + s.t_s, 0) / n;
    const my = xs.reduce((a, s) => a + s.rss, 0) / n;
    const slope =
      xs.reduce((a, s) => a + (s.t_s - mx) * (s.rss - my), 0) / xs.reduce((a, s) => a + (s.t_s - mx) ** 2, 0);
    console.log(
      `soak: ${requests} requests; RSS after the first minute ${Math.min(...xs.map((s) => s.rss)).toFixed(0)}–${Math.max(...xs.map((s) => s.rss)).toFixed(0)} MiB, trend ${(slope * 60).toFixed(1)} MiB/min`,
    );
  }

  if (MINUTES > 0) printSlowest("soak");

  console.log(`fuzz: ${FUZZ} generated malformed requests and documents`);
  const tf = Date.now();
  const fuzzStatuses = new Map();
  const before = new Map(statuses);
  for (let i = 0; i < FUZZ; i += 8) {
    if (i > 0 && i % 1000 === 0) console.log(`  ${i} sent, ${((Date.now() - tf) / 1000).toFixed(0)} s`);
    await Promise.all(
      Array.from({ length: Math.min(8, FUZZ - i) }, (_, k) =>
        (i + k) % 2
          ? send("fuzz-body", "/api/analyses", json(malformedBody()))
          : send("fuzz-document", "/api/mechanisms", {
              method: "POST",
              headers: { "content-type": pick(["application/yaml", "application/json", "text/plain"]) },
              body: malformedDocument(),
            }),
      ),
    );
  }
  for (const [s, n] of statuses) fuzzStatuses.set(s, n - (before.get(s) ?? 0));
  console.log(`fuzz: ${FUZZ} requests in ${((Date.now() - tf) / 1000).toFixed(0)} s`);
  printSlowest("fuzz");
  const list = (m) =>
    [...m]
      .filter(([, n]) => n > 0)
      .sort((a, b) => String(a[0]).localeCompare(String(b[0])))
      .map(([s, n]) => `${s}: ${n}`)
      .join(", ");
  console.log(`fuzz statuses: ${list(fuzzStatuses)}`);
  console.log(`all statuses: ${list(statuses)}`);
  console.log(
    `5xx or network errors: ${fiveHundreds.length}; responses with NaN: ${nans.length}; no answer within ${TIMEOUT_MS / 1000} s: ${timeouts.length}`,
  );
  for (const x of [...fiveHundreds, ...nans, ...timeouts].slice(0, 30)) console.log(`  ${x}`);
  console.log(`RSS at the end: ${rss_MiB().toFixed(0)} MiB`);
} finally {
  server.stop();
}
