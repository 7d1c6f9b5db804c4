// The options of one check and what they resolve to: the exhaustive sizes, the sample count and
// ranges (the file's, with --sizes, --sample and --count applied), FORMAT.md §4.

import type { CompiledConjecture, Fn } from '../language/conjecture/compiled.js';
import type { Value } from '../values/value.js';
import { rangeBound } from './enumerate-cases.js';
import type { HeldRecord } from './work/resume.js';
import type { Shard } from './work/slicing.js';

export interface CheckOptions {
  /** --sizes: replacement exhaustive ranges by binding name. */
  sizes?: Map<string, [number, number]>;
  exhaustive?: boolean;
  /** --sample: replacement sample ranges by binding name. */
  sampleRanges?: Map<string, [number, number]>;
  /** --count; 0 skips sampling. */
  count?: number;
  seed?: string;
  /** A case to try first (from counterexamples/<id>.yaml), as decoded binding values in `for` order. */
  regression?: Value[] | null;
  /** --shard I/K: only this shard's slices of every size and chunks of every sampled size. */
  shard?: Shard | null;
  /** --resume: ledger records of earlier runs; finished sizes and slices of the current hash are skipped. */
  resume?: readonly HeldRecord[] | null;
}

export const DEFAULT_SAMPLE_COUNT = 100;

const constFn =
  (v: number): Fn =>
  () =>
    v;

/** --sizes applied to the range bindings other than the size (the size's range is read by `exhaustiveSizes`). */
export function withSizeOverrides(cc: CompiledConjecture, opts: CheckOptions): CompiledConjecture {
  const sizes = opts.sizes;
  if (!sizes || sizes.size === 0) return cc;
  return {
    ...cc,
    bindings: cc.bindings.map((b) => {
      const r = sizes.get(b.name);
      return r && b.source.kind === 'range' ? { ...b, source: { kind: 'range', lo: constFn(r[0]), hi: constFn(r[1]) } } : b;
    }),
  };
}

/** The exhaustive sizes: the size binding's range (which may not depend on other bindings). */
export function sizesOf(cc: CompiledConjecture): number[] {
  if (cc.sizeIndex < 0) return [];
  const b = cc.bindings[cc.sizeIndex];
  if (b.source.kind !== 'range') return [];
  const frame: Value[] = new Array(cc.frameSize);
  const lo = rangeBound(b.source.lo(frame), b.name),
    hi = rangeBound(b.source.hi(frame), b.name);
  const out: number[] = [];
  for (let v = lo; v <= hi; v++) out.push(v);
  return out;
}

/** The sample ranges: the file's `sample:` with --sample overrides, evaluated. */
export function sampleRangesOf(cc: CompiledConjecture, overrides?: Map<string, [number, number]>): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  const frame: Value[] = new Array(cc.frameSize);
  for (const b of cc.bindings) {
    if (b.sample) out.set(b.name, [rangeBound(b.sample.lo(frame), b.name), rangeBound(b.sample.hi(frame), b.name)]);
  }
  for (const [k, v] of overrides ?? []) out.set(k, v);
  return out;
}

/** The exhaustive sizes of a run: the size binding's range, or --sizes for it. */
export function exhaustiveSizes(cc: CompiledConjecture, opts: CheckOptions): number[] {
  const override = cc.sizeIndex >= 0 ? opts.sizes?.get(cc.bindings[cc.sizeIndex].name) : undefined;
  if (override) return Array.from({ length: Math.max(0, override[1] - override[0] + 1) }, (_, i) => override[0] + i);
  return sizesOf(cc);
}

/** The sample count and ranges of a run (file, then options). */
export function sampleSettingsOf(cc: CompiledConjecture, opts: CheckOptions): { count: number; ranges: Map<string, [number, number]> } {
  return { count: opts.count ?? cc.spec.sample?.count ?? DEFAULT_SAMPLE_COUNT, ranges: sampleRangesOf(cc, opts.sampleRanges) };
}

/** The sizes of the sample phase, in order (empty when there is nothing to sample). */
export function sampleSizes(cc: CompiledConjecture, count: number, ranges: Map<string, [number, number]>): number[] {
  if (cc.sizeIndex < 0 || count === 0) return [];
  const sr = ranges.get(cc.bindings[cc.sizeIndex].name);
  if (!sr) return [];
  const out: number[] = [];
  for (let s = sr[0]; s <= sr[1]; s++) out.push(s);
  return out;
}
