// Forged counterexample files for the hostile corpus: the genuine hash of a conjecture, with
// whatever bindings the forger chose.

import { stringify } from 'yaml';
import '../../../src/families/index.js';
import '../../../src/library/index.js';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
import { conjectureHash } from '../../../src/language/conjecture/conjecture-hash.js';
import { exactDocument } from '../../../src/records/counterexample-file.js';

export function forgedFile(conjecture: string, bindings: Record<string, unknown>, extra: Record<string, unknown> = {}): string {
  const spec = loadConjectureFile('c.yaml', conjecture).conjectures[0];
  return stringify({
    format: 1,
    conjecture: spec.id,
    hash: conjectureHash(spec),
    bindings,
    defines: [],
    document: exactDocument(spec),
    ...extra,
  });
}

/** A true statement: inversions of a permutation of n never exceed n(n-1)/2 (the longest element has the most). */
export const TRUE_BOUND = `conjecture: inv-bounded
expect: holds
for:
  n: 1..6
  w: permutations(n)
claim: inv(w) <= n * (n - 1) / 2
`;
