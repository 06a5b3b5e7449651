/**
 * Test reference for lib/photolysis/twoStream.ts: the two-stream column
 * solved the other way, as one linear system of the continuity conditions
 * at every interface (Toon et al. 1989, J. Geophys. Res. 94, 16287, §3),
 * with the same layer solutions; the library joins the layers by adding
 * instead. Also the band solver it needs.
 *
 * Solves a banded linear system A·x = b in place by Gaussian elimination with
 * partial pivoting (the band form of LU factorisation, as in Golub and Van
 * Loan, Matrix Computations, 4th ed. 2013, §4.3). The two-stream column
 * (twoStream.ts) gives a system with two sub- and two super-diagonals.
 *
 * Storage: row r holds columns r − kl … r + kl + ku at
 * `band[r·width + (c − r + kl)]`, width = 2·kl + ku + 1; the extra kl
 * super-diagonals take the fill-in of row exchanges and must be zero on entry.
 * `rhs` is overwritten with the solution. Returns false (and leaves the
 * arrays undefined) when a pivot is exactly zero.
 */

import type { TwoStreamColumn } from "../../lib/photolysis/twoStream";

/** Width of the band storage for kl sub- and ku super-diagonals. */
export function bandWidth(kl: number, ku: number): number {
  return 2 * kl + ku + 1;
}

export function solveBanded(n: number, kl: number, ku: number, band: Float64Array, rhs: Float64Array): boolean {
  const W = 2 * kl + ku + 1;
  if (band.length < n * W || rhs.length < n) {
    throw new RangeError(`solveBanded: need ${n * W} band and ${n} rhs entries, got ${band.length} and ${rhs.length}`);
  }
  const reach = kl + ku;
  for (let k = 0; k < n; k++) {
    const last = Math.min(n - 1, k + kl);
    let p = k;
    let best = Math.abs(band[k * W + kl]);
    for (let i = k + 1; i <= last; i++) {
      const v = Math.abs(band[i * W + (k - i + kl)]);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (best === 0) return false;
    const right = Math.min(n - 1, k + reach);
    if (p !== k) {
      for (let c = k; c <= right; c++) {
        const a = k * W + (c - k + kl);
        const b = p * W + (c - p + kl);
        const t = band[a];
        band[a] = band[b];
        band[b] = t;
      }
      const t = rhs[k];
      rhs[k] = rhs[p];
      rhs[p] = t;
    }
    const pivot = band[k * W + kl];
    for (let i = k + 1; i <= last; i++) {
      const ik = i * W + (k - i + kl);
      const l = band[ik] / pivot;
      if (l === 0) continue;
      band[ik] = 0;
      for (let c = k + 1; c <= right; c++) band[i * W + (c - i + kl)] -= l * band[k * W + (c - k + kl)];
      rhs[i] -= l * rhs[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let s = rhs[k];
    const right = Math.min(n - 1, k + reach);
    for (let c = k + 1; c <= right; c++) s -= band[k * W + (c - k + kl)] * rhs[c];
    rhs[k] = s / band[k * W + kl];
  }
  return true;
}

/** F↑ and F↓ at every interface from the global continuity system. */
export function continuityFluxes(col: TwoStreamColumn): { up: Float64Array; down: Float64Array } {
  const N = col.layers;
  const KL = 2;
  const KU = 2;
  const W = bandWidth(KL, KU);
  const n = 2 * N;
  const band = new Float64Array(n * W);
  const rhs = new Float64Array(n);
  const lambda = new Float64Array(N);
  const gamma = new Float64Array(N);
  const expo = new Float64Array(N);
  const pUp = new Float64Array(N);
  const pDown = new Float64Array(N);
  const mu0 = Math.max(col.mu0, 0);
  const D = col.slant.map((s) => (s < Number.POSITIVE_INFINITY ? col.beam * Math.exp(-s) : 0));
  for (let k = 0; k < N; k++) {
    const w = col.omega[k];
    const g = col.g[k];
    const g1 = (7 - w * (4 + 3 * g)) / 4;
    const g2 = -(1 - w * (4 - 3 * g)) / 4;
    const g3 = (2 - 3 * g * mu0) / 4;
    const g4 = 1 - g3;
    const lam = Math.sqrt(g1 * g1 - g2 * g2);
    lambda[k] = lam;
    gamma[k] = g2 / (g1 + lam);
    expo[k] = Math.exp(-lam * col.dtau[k]);
    const inv = (col.slant[k + 1] - col.slant[k]) / col.dtau[k];
    const denom = lam * lam - inv * inv;
    pUp[k] = (w * ((g1 - inv) * g3 + g2 * g4)) / denom;
    pDown[k] = (w * ((g1 + inv) * g4 + g2 * g3)) / denom;
  }
  const set = (r: number, c: number, v: number) => {
    band[r * W + (c - r + KL)] = v;
  };
  set(0, 0, 1);
  set(0, 1, gamma[0] * expo[0]);
  rhs[0] = -pDown[0] * D[0];
  for (let k = 0; k < N - 1; k++) {
    const a = 2 * k;
    set(a + 1, a, gamma[k] * expo[k]);
    set(a + 1, a + 1, 1);
    set(a + 1, a + 2, -gamma[k + 1]);
    set(a + 1, a + 3, -expo[k + 1]);
    rhs[a + 1] = (pUp[k + 1] - pUp[k]) * D[k + 1];
    set(a + 2, a, expo[k]);
    set(a + 2, a + 1, gamma[k]);
    set(a + 2, a + 2, -1);
    set(a + 2, a + 3, -gamma[k + 1] * expo[k + 1]);
    rhs[a + 2] = (pDown[k + 1] - pDown[k]) * D[k + 1];
  }
  const L = N - 1;
  const A = col.albedo;
  set(n - 1, 2 * L, gamma[L] * expo[L] - A * expo[L]);
  set(n - 1, 2 * L + 1, 1 - A * gamma[L]);
  rhs[n - 1] = -(pUp[L] - A * pDown[L] - A * mu0) * D[N];
  if (!solveBanded(n, KL, KU, band, rhs)) throw new RangeError("continuityFluxes: singular system");
  const up = new Float64Array(N + 1);
  const down = new Float64Array(N + 1);
  for (let k = 0; k < N; k++) {
    const c1 = rhs[2 * k];
    const c2 = rhs[2 * k + 1];
    up[k] = c1 * gamma[k] + c2 * expo[k] + pUp[k] * D[k];
    down[k] = c1 + c2 * gamma[k] * expo[k] + pDown[k] * D[k];
  }
  const c1 = rhs[2 * L];
  const c2 = rhs[2 * L + 1];
  up[N] = c1 * gamma[L] * expo[L] + c2 + pUp[L] * D[N];
  down[N] = c1 * expo[L] + c2 * gamma[L] + pDown[L] * D[N];
  return { up, down };
}
