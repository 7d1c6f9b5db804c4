import { it } from 'vitest';
import { check, doc } from '/work/main/test/runner/helpers.js';
it('probe', () => {
  const r = check(doc({ for: ['n: 1..5', 'w: permutations(n)'], claim: 'maj(w) <= inv(w)' }));
  console.log(JSON.stringify(r, null, 1));
  const r2 = check(doc({ for: ['n: 1..3', 'w: permutations(n)'], claim: 'inv(w) >= 0', sample: ['n: 10..12', 'count: 5'] }));
  console.log(JSON.stringify(r2.checked));
});
