// The cases of a size as one indexed sequence (enumeration order, before `where`), so that a slice
// [lo, hi) of indices can be visited without visiting the rest. Counting uses the families' exact
// counts wherever the inner bindings do not depend on an outer value, and enumerates only the outer
// objects that inner bindings do depend on (partitions lam, then standardTableaux(lam)).

import type { CompiledConjecture, Frame } from '../../language/conjecture/compiled.js';
import type { Family } from '../../families/family.js';
import type { Value } from '../../values/value.js';
import { rangeBound } from '../enumerate-cases.js';

const independentCache = new WeakMap<CompiledConjecture, boolean[]>();

/**
 * independent[i]: no later binding mentions binding i by name, so the number of cases below a value
 * of binding i is the same for every value. (A textual test: it may see a dependence that is not
 * there, which only costs speed, never correctness.)
 */
export function independentLevels(cc: CompiledConjecture): boolean[] {
  let out = independentCache.get(cc);
  if (out) return out;
  const texts = cc.spec.bindings.map((b) => b.source.text);
  out = cc.bindings.map((b, i) => {
    const word = new RegExp(`(^|[^A-Za-z0-9_])${b.name.replace(/[^A-Za-z0-9_]/g, '\\$&')}($|[^A-Za-z0-9_])`);
    for (let j = i + 1; j < texts.length; j++) if (word.test(texts[j] ?? '')) return false;
    return true;
  });
  independentCache.set(cc, out);
  return out;
}

/** Whether every family of the conjecture can start its enumeration at an index. */
export function hasCheapRanges(cc: CompiledConjecture): boolean {
  return cc.bindings.every((b) => b.source.kind !== 'family' || typeof b.source.family.enumerateRange === 'function');
}

/** The exact number of assignments of bindings from..end, with the frame's earlier slots set. */
export function countFrom(cc: CompiledConjecture, frame: Frame, fixed: Map<number, Value>, from: number): bigint {
  const bs = cc.bindings;
  if (from === bs.length) return 1n;
  const b = bs[from];
  if (fixed.has(from)) {
    frame[b.slot] = fixed.get(from)!;
    return countFrom(cc, frame, fixed, from + 1);
  }
  const indep = independentLevels(cc)[from];
  const src = b.source;
  if (src.kind === 'range') {
    const lo = rangeBound(src.lo(frame), b.name),
      hi = rangeBound(src.hi(frame), b.name);
    if (hi < lo) return 0n;
    if (indep) {
      frame[b.slot] = lo;
      return BigInt(hi - lo + 1) * countFrom(cc, frame, fixed, from + 1);
    }
    let total = 0n;
    for (let v = lo; v <= hi; v++) {
      frame[b.slot] = v;
      total += countFrom(cc, frame, fixed, from + 1);
    }
    return total;
  }
  if (src.kind === 'list') {
    const list = src.list(frame) as Value[];
    if (!Array.isArray(list) || list.length === 0) return 0n;
    if (indep) {
      frame[b.slot] = list[0];
      return BigInt(list.length) * countFrom(cc, frame, fixed, from + 1);
    }
    let total = 0n;
    for (const v of list) {
      frame[b.slot] = v;
      total += countFrom(cc, frame, fixed, from + 1);
    }
    return total;
  }
  const p = src.family.prepare(src.args.map((f) => f(frame)));
  if (indep) {
    const n = src.family.count(p);
    return n === 0n ? 0n : n * countFrom(cc, frame, fixed, from + 1);
  }
  let total = 0n;
  src.family.enumerate(p, (obj: Value) => {
    frame[b.slot] = obj;
    total += countFrom(cc, frame, fixed, from + 1);
  });
  return total;
}

/** The number of cases of a size (all assignments, before `where`). */
export function countCases(cc: CompiledConjecture, fixed: Map<number, Value>): bigint {
  return countFrom(cc, new Array(cc.frameSize), fixed, 0);
}

/**
 * Visit objects lo..hi-1 of a family's enumeration order: the family's own enumerateRange when it
 * has one, else enumerate from the start and skip (correct, but costs the skipped objects).
 * Returns true when `visit` stopped it.
 */
export function enumerateFamilyRange(fam: Family<any, any>, p: unknown, lo: bigint, hi: bigint, visit: (obj: Value) => boolean): boolean {
  if (hi <= lo) return false;
  if (fam.enumerateRange) return fam.enumerateRange(p, lo, hi, visit);
  let k = 0n;
  let stopped = false;
  fam.enumerate(p, (obj: Value) => {
    if (k >= hi) return true;
    if (k >= lo && visit(obj)) {
      stopped = true;
      return true;
    }
    k++;
    return false;
  });
  return stopped;
}

/**
 * Visit the cases with indices lo..hi-1 (enumeration order of enumerateCases), in that order.
 * `onCase` returns true to stop; returns true when stopped.
 */
export function enumerateCaseRange(
  cc: CompiledConjecture,
  frame: Frame,
  fixed: Map<number, Value>,
  lo: bigint,
  hi: bigint,
  onCase: () => boolean,
): boolean {
  const bs = cc.bindings;
  const indep = independentLevels(cc);
  let stopped = false;
  // Visit the part of the subtree at level i (whose first case has index `base`) inside [lo, hi).
  const level = (i: number, base: bigint): void => {
    if (i === bs.length) {
      if (onCase()) stopped = true;
      return;
    }
    const b = bs[i];
    if (fixed.has(i)) {
      frame[b.slot] = fixed.get(i)!;
      level(i + 1, base);
      return;
    }
    const src = b.source;
    if (indep[i]) {
      // Every value has the same number of cases below it: jump straight to the first one needed.
      let per: bigint;
      let n: bigint;
      let p: unknown = null;
      if (src.kind === 'range') {
        const a = rangeBound(src.lo(frame), b.name),
          z = rangeBound(src.hi(frame), b.name);
        n = z < a ? 0n : BigInt(z - a + 1);
        if (n === 0n) return;
        frame[b.slot] = a;
      } else if (src.kind === 'list') {
        const list = src.list(frame) as Value[];
        n = BigInt(list.length);
        if (n === 0n) return;
        frame[b.slot] = list[0];
      } else {
        p = src.family.prepare(src.args.map((f) => f(frame)));
        n = src.family.count(p);
        if (n === 0n) return;
      }
      per = countFrom(cc, frame, fixed, i + 1);
      if (per === 0n) return;
      const first = lo > base ? (lo - base) / per : 0n;
      let last = (hi - base + per - 1n) / per;
      if (last > n) last = n;
      if (first >= last) return;
      if (src.kind === 'range') {
        const a = rangeBound(src.lo(frame), b.name);
        for (let k = first; k < last && !stopped; k++) {
          frame[b.slot] = a + Number(k);
          level(i + 1, base + k * per);
        }
      } else if (src.kind === 'list') {
        const list = src.list(frame) as Value[];
        for (let k = first; k < last && !stopped; k++) {
          frame[b.slot] = list[Number(k)];
          level(i + 1, base + k * per);
        }
      } else if (i + 1 === bs.length) {
        // The innermost binding (the common case): one case per object, no index arithmetic.
        const slot = b.slot;
        enumerateFamilyRange(src.family, p, first, last, (obj) => {
          frame[slot] = obj;
          if (onCase()) stopped = true;
          return stopped;
        });
      } else {
        let k = first;
        const slot = b.slot,
          next = i + 1;
        enumerateFamilyRange(src.family, p, first, last, (obj) => {
          frame[slot] = obj;
          level(next, base + k * per);
          k++;
          return stopped;
        });
      }
      return;
    }
    // The count below a value depends on it: walk the values, skipping whole subtrees by their counts.
    let at = base;
    const visitValue = (v: Value): boolean => {
      frame[b.slot] = v;
      const c = countFrom(cc, frame, fixed, i + 1);
      frame[b.slot] = v; // countFrom may have used deeper slots only, but keep ours exact
      if (at + c > lo && at < hi) level(i + 1, at);
      at += c;
      return stopped || at >= hi;
    };
    if (src.kind === 'range') {
      const a = rangeBound(src.lo(frame), b.name),
        z = rangeBound(src.hi(frame), b.name);
      for (let v = a; v <= z; v++) if (visitValue(v)) break;
    } else if (src.kind === 'list') {
      for (const v of src.list(frame) as Value[]) if (visitValue(v)) break;
    } else {
      const p = src.family.prepare(src.args.map((f) => f(frame)));
      src.family.enumerate(p, visitValue);
    }
  };
  if (hi > lo) level(0, 0n);
  return stopped;
}
