// Drawing one binding of a random case (FORMAT.md §4.3): range bindings uniformly from their sample
// range, lists uniformly, families by their exactly uniform samplers.

import { fail } from '../../base/errors.js';
import type { CompiledBinding, Frame } from '../../language/conjecture/compiled.js';
import type { Value } from '../../values/value.js';
import { rangeBound } from '../enumerate-cases.js';
import type fc from 'fast-check';

/** Draw a value for one binding into the frame. */
export function drawBinding(b: CompiledBinding, frame: Frame, rng: fc.Random, ranges: Map<string, [number, number]>): void {
  const src = b.source;
  if (src.kind === 'range') {
    const r = ranges.get(b.name);
    const lo = r ? r[0] : rangeBound(src.lo(frame), b.name);
    const hi = r ? r[1] : rangeBound(src.hi(frame), b.name);
    if (hi < lo) fail(`the range of ${b.name} is empty (${lo}..${hi})`);
    frame[b.slot] = rng.nextInt(lo, hi);
  } else if (src.kind === 'list') {
    const list = src.list(frame) as Value[];
    if (list.length === 0) fail(`${b.name} ranges over an empty list`);
    frame[b.slot] = list[rng.nextInt(0, list.length - 1)];
  } else {
    const fam = src.family;
    const p = fam.prepare(src.args.map((f) => f(frame)));
    if (fam.count(p) === 0n) fail(`${fam.name}(...) is empty for ${b.name}; nothing to sample`);
    frame[b.slot] = fam.arbitrary(p).generate(rng, undefined).value as Value;
  }
}
