/**
 * Fill-reducing ordering of a sparse matrix: minimum degree on the graph of
 * the symmetrised pattern A + Aᵀ (Tinney & Walker, Proc. IEEE 55, 1801–1809,
 * 1967, "scheme 2"; George & Liu, SIAM Review 31, 1–19, 1989). The graph is
 * kept explicitly: eliminating a node joins its neighbours into a clique.
 * Ties go to the lower index, so the order is deterministic.
 *
 * Cost: about Σ deg² over the eliminations, small for chemistry Jacobians
 * (a few entries per row); the densely connected species (hubs) are left to
 * the end, where their fill is one small dense block.
 */

/**
 * The elimination order (`order[k]` = the node eliminated k-th) of the n×n
 * pattern given in compressed columns (`colStart`, `rowIndex`); the diagonal
 * and duplicate entries are ignored.
 */
export function minimumDegreeOrder(n: number, colStart: Int32Array, rowIndex: Int32Array): Int32Array {
  if (!(Number.isInteger(n) && n >= 0)) throw new RangeError(`minimumDegreeOrder: invalid size ${n}`);
  if (colStart.length !== n + 1)
    throw new RangeError(`minimumDegreeOrder: colStart has ${colStart.length} entries, expected ${n + 1}`);
  const adj: Set<number>[] = Array.from({ length: n }, () => new Set<number>());
  for (let j = 0; j < n; j++) {
    for (let p = colStart[j]; p < colStart[j + 1]; p++) {
      const i = rowIndex[p];
      if (!(i >= 0 && i < n)) throw new RangeError(`minimumDegreeOrder: row index ${i} out of range in column ${j}`);
      if (i === j) continue;
      adj[i].add(j);
      adj[j].add(i);
    }
  }
  // degree buckets as doubly linked lists, so the next node is found without a scan
  const degree = new Int32Array(n);
  const head = new Int32Array(n + 1).fill(-1);
  const next = new Int32Array(n).fill(-1);
  const prev = new Int32Array(n).fill(-1);
  const insert = (v: number) => {
    const d = degree[v];
    prev[v] = -1;
    next[v] = head[d];
    if (head[d] >= 0) prev[head[d]] = v;
    head[d] = v;
  };
  const remove = (v: number) => {
    if (prev[v] >= 0) next[prev[v]] = next[v];
    else head[degree[v]] = next[v];
    if (next[v] >= 0) prev[next[v]] = prev[v];
  };
  for (let v = n - 1; v >= 0; v--) {
    degree[v] = adj[v].size;
    insert(v);
  }
  const order = new Int32Array(n);
  const eliminated = new Uint8Array(n);
  let minDegree = 0;
  for (let k = 0; k < n; k++) {
    while (head[minDegree] < 0) minDegree++;
    // lowest index among the nodes of least degree
    let v = head[minDegree];
    for (let u = next[v]; u >= 0; u = next[u]) if (u < v) v = u;
    remove(v);
    eliminated[v] = 1;
    order[k] = v;
    const nb = [...adj[v]];
    for (const a of nb) {
      const set = adj[a];
      set.delete(v);
      for (const b of nb) if (b !== a) set.add(b);
      remove(a);
      degree[a] = set.size;
      insert(a);
      if (degree[a] < minDegree) minDegree = degree[a];
    }
    adj[v].clear();
  }
  return order;
}
