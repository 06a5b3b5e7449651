/**
 * Elementary pathways (Lehmann 2004, §"splitting"; the rank test of
 * elementary flux modes, Schuster & Hilgetag 1994 / Klamt et al. 2005):
 * a balanced non-negative flux vector v is elementary iff the stoichiometric
 * rows it must balance, restricted to the columns of its support, have a
 * null space of dimension exactly 1. A non-elementary vector is written as a
 * non-negative sum of elementary ones by the conformal greedy decomposition:
 * find an elementary vector e inside supp(v) (walk along a second null-space
 * direction until a component vanishes, repeat), subtract the largest β·e
 * that keeps v ≥ 0, repeat until v = 0. Each step empties at least one
 * component, so at most |supp v| steps. Floating point with a relative
 * tolerance; the coefficients are small integers.
 */
import { integerProportional } from "./rational";
import type { SparseVector } from "./sparseVector";

const DEFAULTS = {
  /** pivot and zero tolerance, relative */
  tolerance: 1e-9,
} as const;

/** Dense matrix of `rows` × `columns`, row-major. */
interface Dense {
  m: number;
  n: number;
  a: Float64Array;
}

function buildMatrix(columns: number[], nets: SparseVector[], isRow: (species: number) => boolean): Dense {
  const rowOf = new Map<number, number>();
  for (const j of columns) for (const s of nets[j].idx) if (!rowOf.has(s) && isRow(s)) rowOf.set(s, rowOf.size);
  const m = rowOf.size;
  const n = columns.length;
  const a = new Float64Array(m * n);
  columns.forEach((j, c) => {
    const net = nets[j];
    for (let t = 0; t < net.idx.length; t++) {
      const r = rowOf.get(net.idx[t]);
      if (r !== undefined) a[r * n + c] = net.val[t];
    }
  });
  return { m, n, a };
}

/** Basis of the right null space of `d` (columns as variables), by reduced row echelon form. */
function nullSpace(d: Dense): number[][] {
  const { m, n } = d;
  const a = Float64Array.from(d.a);
  const pivots: number[] = [];
  let row = 0;
  for (let col = 0; col < n && row < m; col++) {
    let best = row;
    for (let r = row + 1; r < m; r++) if (Math.abs(a[r * n + col]) > Math.abs(a[best * n + col])) best = r;
    if (Math.abs(a[best * n + col]) <= DEFAULTS.tolerance) continue;
    if (best !== row)
      for (let c = 0; c < n; c++) {
        const t = a[row * n + c];
        a[row * n + c] = a[best * n + c];
        a[best * n + c] = t;
      }
    const p = a[row * n + col];
    for (let c = 0; c < n; c++) a[row * n + c] /= p;
    for (let r = 0; r < m; r++) {
      if (r === row) continue;
      const f = a[r * n + col];
      if (f === 0) continue;
      for (let c = 0; c < n; c++) a[r * n + c] -= f * a[row * n + c];
    }
    pivots.push(col);
    row++;
  }
  const isPivot = new Array<boolean>(n).fill(false);
  for (const p of pivots) isPivot[p] = true;
  const basis: number[][] = [];
  for (let f = 0; f < n; f++) {
    if (isPivot[f]) continue;
    const w = new Array<number>(n).fill(0);
    w[f] = 1;
    pivots.forEach((p, r) => {
      w[p] = -a[r * n + f];
    });
    basis.push(w);
  }
  return basis;
}

/** True when the pathway with support `columns` has no proper balanced sub-pathway. */
export function isElementary(columns: number[], nets: SparseVector[], isRow: (species: number) => boolean): boolean {
  if (columns.length <= 1) return true;
  return nullSpace(buildMatrix(columns, nets, isRow)).length <= 1;
}

function proportional(u: number[], w: number[]): boolean {
  let ratio = Number.NaN;
  for (let i = 0; i < u.length; i++) {
    if (Math.abs(u[i]) <= DEFAULTS.tolerance && Math.abs(w[i]) <= DEFAULTS.tolerance) continue;
    if (Math.abs(u[i]) <= DEFAULTS.tolerance || Math.abs(w[i]) <= DEFAULTS.tolerance) return false;
    const r = w[i] / u[i];
    if (Number.isNaN(ratio)) ratio = r;
    else if (Math.abs(r - ratio) > DEFAULTS.tolerance * Math.max(1, Math.abs(ratio)) * 1e3) return false;
  }
  return true;
}

/** One elementary vector inside the support of the balanced vector `v` (same length, ≥ 0). */
function elementaryInside(v: number[], columns: number[], nets: SparseVector[], isRow: (s: number) => boolean) {
  let u = v.slice();
  for (let guard = 0; guard <= v.length; guard++) {
    const scale = Math.max(...u);
    const supp = u.map((x, i) => (x > DEFAULTS.tolerance * scale ? i : -1)).filter((i) => i >= 0);
    const basis = nullSpace(
      buildMatrix(
        supp.map((i) => columns[i]),
        nets,
        isRow,
      ),
    );
    if (basis.length <= 1) {
      const e = new Array<number>(v.length).fill(0);
      supp.forEach((i) => {
        e[i] = u[i];
      });
      return e;
    }
    const uS = supp.map((i) => u[i]);
    let w = basis.find((b) => !proportional(uS, b));
    if (!w) return null;
    if (!w.some((x) => x > DEFAULTS.tolerance)) w = w.map((x) => -x);
    let t = Number.POSITIVE_INFINITY;
    w.forEach((x, k) => {
      if (x > DEFAULTS.tolerance) t = Math.min(t, uS[k] / x);
    });
    const next = new Array<number>(v.length).fill(0);
    supp.forEach((i, k) => {
      const x = uS[k] - t * w![k];
      next[i] = x > DEFAULTS.tolerance * scale ? x : 0;
    });
    u = next;
  }
  return null;
}

/**
 * Decomposes the flux vector `flux` (per entry of `columns`, molecules cm⁻³ s⁻¹
 * through each reaction) into elementary pathways: integer multiplicities
 * aligned with `columns` and a rate. Returns null when the decomposition fails
 * (non-rational ratios), in which case the caller keeps the pathway whole.
 */
export function decomposeElementary(
  flux: number[],
  columns: number[],
  nets: SparseVector[],
  isRow: (species: number) => boolean,
): { multiplicity: number[]; rate: number }[] | null {
  const out: { multiplicity: number[]; rate: number }[] = [];
  let v = flux.slice();
  const scale = Math.max(...flux);
  for (let guard = 0; guard <= flux.length; guard++) {
    if (!v.some((x) => x > DEFAULTS.tolerance * scale)) return out;
    const e = elementaryInside(v, columns, nets, isRow);
    if (!e) return null;
    const ints = integerProportional(e);
    if (!ints) return null;
    let beta = Number.POSITIVE_INFINITY;
    ints.forEach((m, i) => {
      if (m > 0) beta = Math.min(beta, v[i] / m);
    });
    out.push({ multiplicity: ints, rate: beta });
    v = v.map((x, i) => {
      const y = x - beta * ints[i];
      return y > DEFAULTS.tolerance * scale ? y : 0;
    });
  }
  return v.some((x) => x > DEFAULTS.tolerance * scale) ? null : out;
}
