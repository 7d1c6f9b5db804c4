// Micro-benchmark of the compiled hot path against a plain loop (run after `npx tsc -p .`):
//   node test/language/expr/bench-inv.mjs [maxN=10]
// Uses the library's inv/inverse when registered, else equivalent local ones.
import { Compiler, parseExpression, textOrigin } from '../../../dist/language/expr/index.js';
import { defineFunction, getFunction } from '../../../dist/library/registry.js';
import '../../../dist/library/permutations.js';
import { permutations } from '../../../dist/families/permutations/permutations.js';
import { Permutation, inversions } from '../../../dist/families/permutations/permutation.js';
function inverseArr(a) {
  const b = new Array(a.length);
  for (let i = 0; i < a.length; i++) b[a[i] - 1] = i + 1;
  return b;
}
if (!getFunction('inv'))
  defineFunction({
    name: 'inv',
    topic: 'p',
    params: [{ name: 'w', type: 'permutation' }],
    returns: 'integer',
    description: '',
    example: '',
    exampleValue: '',
    source: '',
    impl: (w) => inversions(w.a),
  });
if (!getFunction('inverse'))
  defineFunction({
    name: 'inverse',
    topic: 'p',
    params: [{ name: 'w', type: 'permutation' }],
    returns: 'permutation',
    description: '',
    example: '',
    exampleValue: '',
    source: '',
    impl: (w) => new Permutation(inverseArr(w.a)),
  });
const inv = getFunction('inv').impl,
  inverse = getFunction('inverse').impl;
const N = Number(process.argv[2] ?? 10);
function loop() {
  let ok = 0;
  for (let n = 1; n <= N; n++)
    permutations.enumerate({ n }, (w) => {
      if (inv(w) === inv(inverse(w))) ok++;
    });
  return ok;
}
function hunch() {
  const c = new Compiler({ file: 'b', indeterminates: [], defines: [] });
  const wSlot = c.declareSlot('w', 'permutation');
  const text = 'inv(w) == inv(inverse(w))';
  const { fn } = c.compile(parseExpression(text, textOrigin('b', text)));
  const fr = new Array(c.frameSize());
  let ok = 0;
  for (let n = 1; n <= N; n++)
    permutations.enumerate({ n }, (w) => {
      fr[wSlot] = w;
      if (fn(fr) === true) ok++;
    });
  return ok;
}
for (let r = 0; r < 3; r++) {
  let t = performance.now();
  const a = loop();
  const tl = performance.now() - t;
  t = performance.now();
  const b = hunch();
  const th = performance.now() - t;
  console.log(`loop ${tl.toFixed(0)}ms hunch ${th.toFixed(0)}ms ratio ${(th / tl).toFixed(2)} (${a} ${b})`);
}
