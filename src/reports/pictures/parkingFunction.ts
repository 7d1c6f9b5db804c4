// A parking function as its parking outcome: car i prefers spot a_i and takes the first free spot
// from there on; the strip shows which car ends up in each spot.

import type { Glyphs } from './glyphs.js';
import { digits, finish, padLeft } from './layout.js';

/** Relies on ParkingFunction.values: a_1, ..., a_n. */
export function drawParkingFunction(values: readonly number[], _g: Glyphs): string {
  const n = values.length;
  if (n === 0) return '(the empty parking function)';
  const carAt = new Array<number>(n + 1).fill(0);
  values.forEach((p, i) => {
    let s = p;
    while (s <= n && carAt[s]) s++;
    if (s <= n) carAt[s] = i + 1;
  });
  const d = digits(n);
  const cells = (xs: (number | string)[]) => xs.map((x) => padLeft(String(x), d)).join(' ');
  return finish([
    `a    = ${cells([...values])}`,
    `spot   ${cells(Array.from({ length: n }, (_, i) => i + 1))}`,
    `car    ${cells(carAt.slice(1).map((c) => (c ? c : '.')))}`,
    'car i prefers spot a_i and parks in the first free spot from there on',
  ]);
}
