// Shape arithmetic shared by the tableau families and functions: hooks, contents, the hook length
// and hook-content formulas (exact, in BigInt), and reading a partition argument.

import { fail } from '../../base/errors.js';
import { valueToText } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { Partition, conjugateParts, isPartitionList } from '../partitions/partition.js';
import { factorialBig } from '../permutations/permutations.js';

/** A partition argument: a partition object or a list of weakly decreasing positive integers. */
export function partitionArg(v: Value, what = 'lambda'): number[] {
  if (v instanceof Partition) return v.parts;
  if (Array.isArray(v) && isPartitionList(v)) return v as number[];
  fail(`${what} must be a partition (weakly decreasing positive integers), got ${valueToText(v)}`);
}

export function sizeOf(parts: readonly number[]): number {
  let s = 0;
  for (const p of parts) s += p;
  return s;
}

/** Hook lengths, row by row: h(i, j) = lambda_i - j + lambda'_j - i + 1. */
export function hookLengths(parts: readonly number[]): number[][] {
  const c = conjugateParts(parts);
  return parts.map((l, i) => Array.from({ length: l }, (_, j) => l - j + c[j] - i - 1));
}

/** Contents j - i, row by row (cells 1-based: (1, 1) has content 0). */
export function contentsOf(parts: readonly number[]): number[][] {
  return parts.map((l, i) => Array.from({ length: l }, (_, j) => j - i));
}

/** f^lambda = n! / prod hooks (Frame, Robinson and Thrall, Canad. J. Math. 6 (1954)). */
export function hookLengthCount(parts: readonly number[]): bigint {
  let den = 1n;
  for (const row of hookLengths(parts)) for (const h of row) den *= BigInt(h);
  return factorialBig(sizeOf(parts)) / den;
}

/**
 * s_lambda(1^m) = prod (m + c(u)) / h(u), the number of semistandard tableaux of shape lambda with
 * entries in 1..m (Stanley, Enumerative Combinatorics 2, Cor. 7.21.4). The product of the
 * numerators is divisible by that of the hooks, so the division is exact.
 */
export function hookContentCount(parts: readonly number[], m: number): bigint {
  let num = 1n,
    den = 1n;
  const hooks = hookLengths(parts);
  for (let i = 0; i < parts.length; i++) {
    for (let j = 0; j < parts[i]; j++) {
      const f = m + j - i;
      if (f <= 0) return 0n;
      num *= BigInt(f);
      den *= BigInt(hooks[i][j]);
    }
  }
  return num / den;
}

/** Whether `inner` fits inside `outer` (as Young diagrams). */
export function contains(outer: readonly number[], inner: readonly number[]): boolean {
  if (inner.length > outer.length) return false;
  for (let i = 0; i < inner.length; i++) if (inner[i] > outer[i]) return false;
  return true;
}
