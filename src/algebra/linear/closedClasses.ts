// Communicating classes of a chain's support graph (Tarjan's strongly connected components,
// iterative so that large chains do not overflow the stack). A class is closed when no move
// leaves it; the stationary measures are exactly the mixtures of one measure per closed class
// (Kemeny and Snell, Finite Markov Chains, 1960, ch. II and V), so it is unique iff there is one.

import type { SparseChain } from './sparseChain.js';

/** The strongly connected components; comp[s] is the component of s (numbered in completion order). */
export function stronglyConnected(c: SparseChain): { comp: Int32Array; count: number } {
  const n = c.size;
  const index = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const comp = new Int32Array(n).fill(-1);
  const stack = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const callState = new Int32Array(n); // DFS frames: state
  const callEdge = new Int32Array(n); // DFS frames: next edge to look at
  let sp = 0,
    depth = 0,
    counter = 0,
    count = 0;
  for (let root = 0; root < n; root++) {
    if (index[root] >= 0) continue;
    callState[0] = root;
    callEdge[0] = c.rowStart[root];
    depth = 1;
    index[root] = low[root] = counter++;
    stack[sp++] = root;
    onStack[root] = 1;
    while (depth > 0) {
      const v = callState[depth - 1];
      const e = callEdge[depth - 1];
      if (e < c.rowStart[v + 1]) {
        callEdge[depth - 1] = e + 1;
        const w = c.target[e];
        if (index[w] < 0) {
          index[w] = low[w] = counter++;
          stack[sp++] = w;
          onStack[w] = 1;
          callState[depth] = w;
          callEdge[depth] = c.rowStart[w];
          depth++;
        } else if (onStack[w] && index[w] < low[v]) low[v] = index[w];
        continue;
      }
      // v is finished.
      if (low[v] === index[v]) {
        let w: number;
        do {
          w = stack[--sp];
          onStack[w] = 0;
          comp[w] = count;
        } while (w !== v);
        count++;
      }
      depth--;
      if (depth > 0) {
        const u = callState[depth - 1];
        if (low[v] < low[u]) low[u] = low[v];
      }
    }
  }
  return { comp, count };
}

/** The closed communicating classes, each as its sorted list of states, ordered by smallest state. */
export function closedClasses(c: SparseChain): number[][] {
  const { comp, count } = stronglyConnected(c);
  const leaves = new Uint8Array(count);
  for (let s = 0; s < c.size; s++) {
    for (let k = c.rowStart[s]; k < c.rowStart[s + 1]; k++) if (comp[c.target[k]] !== comp[s]) leaves[comp[s]] = 1;
  }
  const members = new Map<number, number[]>();
  for (let s = 0; s < c.size; s++) {
    if (leaves[comp[s]]) continue;
    let list = members.get(comp[s]);
    if (!list) members.set(comp[s], (list = []));
    list.push(s);
  }
  return [...members.values()].sort((a, b) => a[0] - b[0]);
}
