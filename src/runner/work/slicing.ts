// How a size's cases are cut into slices, and which slices a shard owns. Everything here depends only
// on the number of cases N of the size, on K (the number of shards) and on whether the conjecture's
// enumeration can start in the middle cheaply — never on the number of worker threads — so the same
// slice means the same cases in every process, and ledger records of slices from different runs fit.
//
// The slice count S(N, K) is the base count rounded up to a multiple of K (at least K). Shard I of K
// owns the slices j (0-based) with j ≡ I-1 (mod K), interleaved so each shard gets cases from every
// part of the enumeration. Because S(N, S(N, K)) = S(N, K), a record "a/b" means the same cases
// whether b was a shard count or a slice count, so the ledger's "every slice present" rule holds.

/** A shard of a run: the 1-based index and the count ("3/8" is { index: 3, of: 8 }). */
export interface Shard {
  index: number;
  of: number;
}

/** Aim for slices of at least this many cases: each costs a message and, at most, an unranking. */
export const MIN_SLICE_CASES = 4096n;
/** Enough slices to keep many cores busy and to resume an interrupted size at a fine grain. */
export const MAX_BASE_SLICES = 256;
/**
 * When some family cannot start its enumeration in the middle, a slice re-enumerates everything
 * before it; few slices then keep the waste small.
 */
export const MAX_BASE_SLICES_WITHOUT_RANGES = 16;

/** The text of a shard or slice, "3/8": the one printer (parseShard reads it back). */
export function shardText(s: Shard): string {
  return `${s.index}/${s.of}`;
}

/** The number of slices of a size with n cases, for K shards. */
export function sliceCount(n: bigint, k: number, cheapRanges: boolean): number {
  const cap = cheapRanges ? MAX_BASE_SLICES : MAX_BASE_SLICES_WITHOUT_RANGES;
  const wanted = n <= 0n ? 1n : (n + MIN_SLICE_CASES - 1n) / MIN_SLICE_CASES;
  const base = Number(wanted > BigInt(cap) ? BigInt(cap) : wanted);
  const atLeastK = Math.max(base, k);
  return Math.ceil(atLeastK / k) * k;
}

/** The case indices [lo, hi) of slice j (0-based) of s slices of n cases. */
export function sliceBounds(n: bigint, s: number, j: number): [bigint, bigint] {
  const S = BigInt(s);
  return [(BigInt(j) * n) / S, (BigInt(j + 1) * n) / S];
}

/** The slices (0-based) a shard owns among s slices; every slice when there is no shard. */
export function slicesOfShard(s: number, shard: Shard | null): number[] {
  const out: number[] = [];
  for (let j = 0; j < s; j++) if (!shard || j % shard.of === shard.index - 1) out.push(j);
  return out;
}

// --- The sample phase: a size's `count` random cases, cut into chunks seeded one by one. ---

/** Chunks per size: enough for balance; their count depends only on `count`. */
export const MAX_SAMPLE_CHUNKS = 128;

export function chunkCount(count: number): number {
  return Math.max(1, Math.min(count, MAX_SAMPLE_CHUNKS));
}

/** How many cases chunk c (0-based) of m chunks draws out of `count`. */
export function chunkQuota(count: number, m: number, c: number): number {
  return Math.floor(((c + 1) * count) / m) - Math.floor((c * count) / m);
}

/** The chunks (0-based) a shard owns among m chunks. */
export function chunksOfShard(m: number, shard: Shard | null): number[] {
  return slicesOfShard(m, shard);
}

/** Parse "I/K" (1 <= I <= K, no spaces, no leading zeros): the one reader of shard and slice texts. */
export function parseShard(text: string): Shard | null {
  const m = /^([1-9][0-9]*)\/([1-9][0-9]*)$/.exec(text);
  if (!m) return null;
  const index = Number(m[1]),
    of = Number(m[2]);
  if (!Number.isSafeInteger(of) || index > of) return null;
  return { index, of };
}

/** The --shard option: "I/K", with spaces allowed around the numbers. */
export function parseShardOption(text: string): Shard | null {
  return parseShard(text.trim().replace(/\s*\/\s*/, '/'));
}
