// Shrinking a sampled counterexample (FORMAT.md §4.3, LIBRARY.md §1). Each round collects every
// candidate one step simpler — lower a range binding, or a family's shrink step (size-reducing
// steps lower the size binding together with the object when the family's argument names it) —
// keeps those that are still valid cases (membership, ranges, `where`) and still fail, and moves to
// the simplest of them. Every step is strictly simpler, so shrinking ends; it stops at a case that
// no step can simplify further.

import { EvalError } from '../base/errors.js';
import type { CompiledConjecture, Frame } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { compareCases } from './case-order.js';
import { frameFor } from './case-report.js';
import { rangeBound } from './enumerate-cases.js';
import { enumerateCases } from './enumerate-cases.js';
import { evaluateCase } from './evaluate-case.js';
import { plannedCases } from './plan.js';
import { own } from '../values/operations.js';
import type { RunHooks } from './hooks.js';

const MAX_STEPS = 100_000;
const MAX_CANDIDATES_PER_ROUND = 5_000;

export function isValid(cc: CompiledConjecture, vals: Value[], sampleRanges: Map<string, [number, number]>): boolean {
  const frame = frameFor(cc, vals);
  for (let i = 0; i < cc.bindings.length; i++) {
    const b = cc.bindings[i];
    const src = b.source;
    if (src.kind === 'range') {
      const v = vals[i] as number;
      const lo = rangeBound(src.lo(frame), b.name);
      const s = sampleRanges.get(b.name);
      const min = s ? Math.min(lo, s[0]) : lo;
      if (v < min) return false;
      if (i !== cc.sizeIndex && !s && v > rangeBound(src.hi(frame), b.name)) return false;
    } else if (src.kind === 'family') {
      const p = src.family.prepare(src.args.map((f) => f(frame)));
      if (!src.family.isMember(p, vals[i] as any)) return false;
    } else {
      const list = src.list(frame) as Value[];
      if (!list.includes(vals[i])) return false;
    }
  }
  return true;
}

function stillFails(cc: CompiledConjecture, vals: Value[], sampleRanges: Map<string, [number, number]>): boolean {
  try {
    if (!isValid(cc, vals, sampleRanges)) return false;
    return evaluateCase(cc, frameFor(cc, vals)) === 0;
  } catch (e) {
    if (e instanceof EvalError) return false; // a case that errors is not the same failure
    throw e;
  }
}

/** After bindings changed, bring later family objects to their (possibly smaller) parameters. */
function repair(cc: CompiledConjecture, vals: Value[], changed: number): Value[] | null {
  const frame = frameFor(cc, vals);
  for (let j = 0; j < cc.bindings.length; j++) {
    const src = cc.bindings[j].source;
    if (j === changed || src.kind !== 'family') continue;
    let p;
    try {
      p = src.family.prepare(src.args.map((f) => f(frame)));
    } catch (e) {
      if (e instanceof EvalError) return null;
      throw e;
    }
    if (src.family.isMember(p, vals[j] as any)) continue;
    // One shrink step of that object onto the new parameters, if the family has one.
    let found: Value | null = null;
    const oldP = currentParams(cc, vals, j, frame);
    if (oldP === undefined) return null;
    for (const sh of src.family.shrink(oldP, vals[j] as any)) {
      if (src.family.isMember(p, sh.obj)) {
        found = sh.obj as Value;
        break;
      }
    }
    if (found === null) return null;
    vals[j] = found;
    frame[cc.bindings[j].slot] = found;
  }
  return vals;
}

/** The parameters an object was a member at, found by trying the size one above (used by repair). */
function currentParams(cc: CompiledConjecture, vals: Value[], j: number, frame: Frame): unknown {
  const src = cc.bindings[j].source;
  if (src.kind !== 'family') return undefined;
  const f2 = frame.slice();
  for (let k = 0; k < cc.bindings.length; k++) {
    const b = cc.bindings[k];
    if (b.source.kind === 'range' && src.argNames.includes(b.name)) f2[b.slot] = (frame[b.slot] as number) + 1;
  }
  try {
    const p = src.family.prepare(src.args.map((f) => f(f2)));
    return src.family.isMember(p, vals[j] as any) ? p : undefined;
  } catch {
    return undefined;
  }
}

function* candidates(cc: CompiledConjecture, vals: Value[], sampleRanges: Map<string, [number, number]>): Generator<Value[]> {
  const frame = frameFor(cc, vals);
  // Family shrink steps (the family lists size-reducing ones first).
  for (let i = 0; i < cc.bindings.length; i++) {
    const b = cc.bindings[i];
    const src = b.source;
    if (src.kind !== 'family') continue;
    let p;
    try {
      p = src.family.prepare(src.args.map((f) => f(frame)));
    } catch {
      continue;
    }
    for (const sh of src.family.shrink(p, vals[i] as any)) {
      let next = vals.slice();
      next[i] = sh.obj as Value;
      if (sh.size !== undefined) {
        const r = src.argNames.find((nm) => nm !== null && cc.bindings.some((x) => x.name === nm && x.source.kind === 'range'));
        if (!r) continue; // the size is not a bare binding: cannot lower it together with the object
        const k = cc.bindings.findIndex((x) => x.name === r);
        next[k] = sh.size;
        const fixed = repair(cc, next, i);
        if (!fixed) continue;
        next = fixed;
      }
      yield next;
    }
  }
  // Lower a range binding (for aggregate claims, or bindings no family depends on).
  for (let i = 0; i < cc.bindings.length; i++) {
    const b = cc.bindings[i];
    if (b.source.kind !== 'range') continue;
    const v = vals[i] as number;
    let lo: number;
    try {
      lo = rangeBound(b.source.lo(frame), b.name);
    } catch {
      continue;
    }
    const s = sampleRanges.get(b.name);
    if (s) lo = Math.min(lo, s[0]);
    for (const w of new Set([lo, Math.floor((lo + v) / 2), v - 1])) {
      if (w >= v || w < lo) continue;
      const next = vals.slice();
      next[i] = w;
      const fixed = w === v - 1 ? repair(cc, next, i) : next;
      if (fixed) yield fixed;
    }
  }
}

export function shrinkCase(
  cc: CompiledConjecture,
  failing: Value[],
  sampleRanges: Map<string, [number, number]>,
  hooks: RunHooks,
): { bindings: Value[]; steps: number; completedBySearch: boolean } {
  let current = failing;
  let steps = 0;
  let completedBySearch = false;
  while (steps < MAX_STEPS) {
    let best: Value[] | null = null;
    let seen = 0;
    for (const cand of candidates(cc, current, sampleRanges)) {
      if (++seen > MAX_CANDIDATES_PER_ROUND) break;
      if (best !== null && compareCases(cc, cand, best) >= 0) continue;
      if (compareCases(cc, cand, current) >= 0) continue; // never accept a step that is not simpler
      if (stillFails(cc, cand, sampleRanges)) best = cand;
    }
    if (best === null) break;
    current = best;
    steps++;
    if ((steps & 15) === 0 && hooks.shouldStop?.()) break;
  }
  // Greedy steps can stop at a case that is locally minimal but not of the smallest size (every
  // deletion loses the failure). Sizes below it that are small enough are then searched
  // exhaustively, smallest first: the first one with a failure gives the simplest case there.
  const found = searchSmallerSizes(cc, current, sampleRanges, hooks);
  if (found) {
    current = found;
    steps++;
    completedBySearch = true;
  }
  return { bindings: current, steps, completedBySearch };
}

/** Sizes with at most this many cases are searched exhaustively below a shrunk case. */
const SEARCH_CASES_PER_SIZE = 100_000n;
/** And no more than this many in all, */
const SEARCH_CASES_TOTAL = 300_000n;
/** nor for longer than this (milliseconds). */
const SEARCH_MS = 5_000;

function searchSmallerSizes(
  cc: CompiledConjecture,
  current: Value[],
  sampleRanges: Map<string, [number, number]>,
  hooks: RunHooks,
): Value[] | null {
  if (cc.sizeIndex < 0) return null;
  const sb = cc.bindings[cc.sizeIndex];
  if (sb.source.kind !== 'range') return null;
  const s = current[cc.sizeIndex] as number;
  let lo: number;
  try {
    lo = rangeBound(sb.source.lo(frameFor(cc, current)), sb.name);
  } catch {
    return null;
  }
  const sr = sampleRanges.get(sb.name);
  if (sr) lo = Math.min(lo, sr[0]);
  let budget = SEARCH_CASES_TOTAL;
  const frame: Frame = new Array(cc.frameSize);
  // Slow cases (a big polynomial per case) make the search costly in time, not count: give up
  // after a few seconds and keep the greedy result.
  const deadline = performance.now() + SEARCH_MS;
  let timedOut = false;
  let seen = 0;
  for (let v = lo; v < s; v++) {
    const fixed = new Map<number, Value>([[cc.sizeIndex, v]]);
    let planned: bigint | null;
    try {
      planned = plannedCases(cc, fixed);
    } catch {
      return null;
    }
    if (planned === null || planned > SEARCH_CASES_PER_SIZE || planned > budget) return null;
    budget -= planned;
    let best: Value[] | null = null;
    try {
      enumerateCases(cc, frame, fixed, () => {
        if ((++seen & 63) === 0 && performance.now() > deadline) {
          timedOut = true;
          return true;
        }
        const r = evaluateCase(cc, frame);
        if (r === 0) {
          const c = cc.bindings.map((b) => frame[b.slot]);
          if (best === null || compareCases(cc, c, best) < 0) best = c.map(own);
        }
        return false;
      });
    } catch (e) {
      if (e instanceof EvalError) return null; // a smaller size that errors: keep the greedy result
      throw e;
    }
    if (best !== null) return best; // smaller than the greedy result even if the search ran out of time
    if (timedOut) return null;
    if (hooks.shouldStop?.()) return null;
  }
  return null;
}
