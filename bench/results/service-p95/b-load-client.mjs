// load client: batches of N concurrent POSTs, time to last byte, raw bytes not decoded
import http from "node:http";
const [port, path = "/api/analyses/preview", batches = "20", conc = "8", enc = "gzip, deflate", same = ""] = process.argv.slice(2);
const agent = new http.Agent({ keepAlive: true, maxSockets: 64 });
let step = Number(process.env.STEP0 ?? Math.floor(Math.random() * 1e6));
const alt = () => (same ? 30 : 20 + ((++step * 0.6180339887498949) % 30));
function one() {
  const body = JSON.stringify({ mechanismId: "reference", condition: { altitude_km: alt(), zenith_deg: 40 } });
  const t0 = performance.now();
  return new Promise((res, rej) => {
    const headers = { "content-type": "application/json", "content-length": Buffer.byteLength(body) };
    if (enc) headers["accept-encoding"] = enc;
    const q = http.request({ host: "127.0.0.1", port, path, method: "POST", agent, headers }, (r) => {
      let n = 0;
      r.on("data", (c) => (n += c.length));
      r.on("end", () => (r.statusCode === 200 || r.statusCode === 201 ? res({ ms: performance.now() - t0, n, ce: r.headers["content-encoding"] }) : rej(new Error(`status ${r.statusCode}`))));
    });
    q.on("error", rej);
    q.end(body);
  });
}
const q = (s, p) => s[Math.min(s.length - 1, Math.round((s.length - 1) * p))];
await Promise.all(Array.from({ length: Number(conc) }, one)); // warm-up
import { readdirSync, readFileSync } from "node:fs";
const spid = process.env.SERVER_PID;
const threads = () => Object.fromEntries(spid ? readdirSync(`/proc/${spid}/task`).map((t) => { const f = readFileSync(`/proc/${spid}/task/${t}/stat`, "utf8").split(") ")[1].split(" "); return [t, (Number(f[11]) + Number(f[12])) * 10]; }) : []);
const th0 = threads();
const cpu0 = process.cpuUsage();
const slowest = [], all = [];
let bytes = 0, ce;
for (let b = 0; b < Number(batches); b++) {
  const r = await Promise.all(Array.from({ length: Number(conc) }, one));
  slowest.push(Math.max(...r.map((x) => x.ms)));
  for (const x of r) { all.push(x.ms); bytes = x.n; ce = x.ce; }
}
const cpu = process.cpuUsage(cpu0);
const th1 = threads();
const perThread = Object.entries(th1).map(([t, v]) => [t, (v - (th0[t] ?? 0)) / all.length]).filter(([, v]) => v > 0);
const serverCpuMsPerReq = +perThread.reduce((a, [, v]) => a + v, 0).toFixed(2);
slowest.sort((a, b) => a - b); all.sort((a, b) => a - b);
console.log(JSON.stringify({ path, conc: +conc, batches: +batches, enc, ce: ce ?? "identity", bytes, slowestMedian: +q(slowest, 0.5).toFixed(1), slowestP95: +q(slowest, 0.95).toFixed(1), eachMedian: +q(all, 0.5).toFixed(1), clientCpuMsPerReq: +((cpu.user + cpu.system) / 1000 / all.length).toFixed(2), serverCpuMsPerReq, perThread: perThread.map(([t, v]) => `${t}:${v.toFixed(2)}`).join(" "), load: readFileSync("/proc/loadavg", "utf8").split(" ")[0] }));
agent.destroy();
