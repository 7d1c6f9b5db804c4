// The simplicity order on whole cases: bindings compared in `for` order, range bindings by value,
// family bindings by their family's simplicity order (LIBRARY.md §1), so "the" counterexample of a
// size is well defined and does not depend on enumeration order, workers or shards.

import type { CompiledConjecture } from '../language/conjecture/compiled.js';
import { compareValues } from '../values/order.js';
import type { Value } from '../values/value.js';

export function compareCases(cc: CompiledConjecture, a: readonly Value[], b: readonly Value[]): number {
  for (let i = 0; i < cc.bindings.length; i++) {
    const src = cc.bindings[i].source;
    let c: number;
    if (src.kind === 'family') {
      const x = a[i] as any,
        y = b[i] as any;
      c = x.kind === y.kind ? src.family.compare(x, y) : compareValues(x, y);
    } else c = compareValues(a[i], b[i]);
    if (c !== 0) return c;
  }
  return 0;
}
