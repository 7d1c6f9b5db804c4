// The arc diagram of a set partition: each block {b_1 < b_2 < ... < b_k} gives the arcs
// (b_1, b_2), ..., (b_{k-1}, b_k). Two arcs (i1, j1), (i2, j2) with i1 < i2 cross when
// i1 < i2 < j1 < j2 and nest when i1 < i2 < j2 < j1 (Chen, Deng, Du, Stanley and Yan, "Crossings
// and nestings of matchings and partitions", Trans. Amer. Math. Soc. 359 (2007)).

/** The arcs [i, j] of the partition with restricted growth string rgs, sorted by i. */
export function partitionArcs(rgs: readonly number[]): [number, number][] {
  const last = new Map<number, number>();
  const out: [number, number][] = [];
  rgs.forEach((b, k) => {
    const prev = last.get(b);
    if (prev !== undefined) out.push([prev, k + 1]);
    last.set(b, k + 1);
  });
  return out.sort((x, y) => x[0] - y[0]);
}

export function partitionCrossings(rgs: readonly number[]): number {
  const arcs = partitionArcs(rgs);
  let c = 0;
  for (let a = 0; a < arcs.length; a++)
    for (let b = a + 1; b < arcs.length; b++) {
      const [i1, j1] = arcs[a],
        [i2, j2] = arcs[b];
      if (i1 < i2 && i2 < j1 && j1 < j2) c++;
    }
  return c;
}

export function partitionNestings(rgs: readonly number[]): number {
  const arcs = partitionArcs(rgs);
  let c = 0;
  for (let a = 0; a < arcs.length; a++)
    for (let b = a + 1; b < arcs.length; b++) {
      const [i1, j1] = arcs[a],
        [i2, j2] = arcs[b];
      if (i1 < i2 && j2 < j1) c++;
    }
  return c;
}

/**
 * Whether no two blocks cross: there are no a < b < c < d with a, c in one block and b, d in
 * another. Equivalent to no two crossing arcs. One pass with a stack of open blocks: an element
 * must belong to the block on top of the stack of blocks that have elements both before and after it.
 */
export function isNoncrossing(rgs: readonly number[]): boolean {
  const n = rgs.length;
  const lastOf = new Map<number, number>();
  rgs.forEach((b, k) => lastOf.set(b, k));
  const stack: number[] = [];
  for (let k = 0; k < n; k++) {
    const b = rgs[k];
    const top = stack.length ? stack[stack.length - 1] : -1;
    if (b !== top) {
      if (stack.includes(b)) return false; // b is open below another open block
      stack.push(b);
    }
    if (lastOf.get(b) === k) stack.pop();
  }
  return true;
}
