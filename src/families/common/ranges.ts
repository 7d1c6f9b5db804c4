// Helpers for Family.enumerateRange (a slice of a size is visited without walking the
// objects before it).
//
// The families use one of two methods. Those with a successor function (next permutation, next
// partition, ...) unrank the first object of the range by counts and then step. Those that
// enumerate depth first pass over whole subtrees by their counts while objects remain to be
// skipped, and then go on exactly as `enumerate` does; the counts are needed along one path only.

import type { Visit } from '../family.js';

/**
 * The range [lo, hi) clamped to [0, total): its first index and its length, or undefined when it
 * is empty. The length is a number: a range of more than 2^53 objects cannot be visited anyway.
 */
export function clampRange(lo: bigint, hi: bigint, total: bigint): { first: bigint; length: number } | undefined {
  if (lo < 0n) lo = 0n;
  if (hi > total) hi = total;
  if (lo >= hi) return undefined;
  return { first: lo, length: Number(hi - lo) };
}

/**
 * Visit objects lo..hi-1 of an enumeration by walking it from the start and skipping the ones
 * before lo. The fallback of a family for parameters where its counts would be too costly.
 */
export function enumerateBySkipping<T>(enumerate: (visit: Visit<T>) => boolean, lo: bigint, hi: bigint, visit: Visit<T>): boolean {
  if (lo < 0n) lo = 0n;
  if (lo >= hi) return false;
  let k = 0n;
  let stopped = false;
  enumerate((obj) => {
    if (k >= hi) return true;
    if (k >= lo && visit(obj) === true) {
      stopped = true;
      return true;
    }
    k++;
    return k >= hi;
  });
  return stopped;
}
