// One size of the sample phase as chunks: chunk c draws its share of `count` cases from a generator
// seeded by (seed, id, size, c), so the cases do not depend on workers or shards. The first failure
// in chunk order is the one shrunk; counts stop there too, whatever ran after it.

import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import type { CheckedPiece, ErrorInfo } from '../result.js';
import type { HeldCounts, ResumeIndex } from './resume.js';
import { chunkCount, chunkQuota, chunksOfShard, shardText, type Shard } from './slicing.js';
import type { ChunkOutcome } from './units.js';

export interface SamplePlan {
  size: number;
  label: string;
  count: number;
  chunks: number;
  /** The chunks (0-based) this run draws, in order. */
  units: number[];
  shard: Shard | null;
  covered: HeldCounts | null;
}

export function planSampleSize(
  cc: CompiledConjecture,
  size: number,
  count: number,
  seed: string,
  shard: Shard | null,
  resume: ResumeIndex | null,
): SamplePlan {
  const name = cc.bindings[cc.sizeIndex].name;
  const chunks = chunkCount(count);
  const covered = resume ? resume.sampleCovered({ [name]: size }, seed, shard) : null;
  return {
    size,
    label: `${cc.spec.id}: sampling ${name} = ${size}`,
    count,
    chunks,
    units: covered ? [] : chunksOfShard(chunks, shard),
    shard,
    covered,
  };
}

export function quotaOf(plan: SamplePlan, c: number): number {
  return chunkQuota(plan.count, plan.chunks, c);
}

/** The cases this run plans to draw at the size (for progress). */
export function plannedDraws(plan: SamplePlan): number {
  return plan.units.reduce((s, c) => s + quotaOf(plan, c), 0);
}

export interface SampleSizeOutcome {
  piece: CheckedPiece;
  complete: boolean;
  /** The chunk whose failure is the one to shrink (the first in chunk order). */
  failingChunk: number | null;
  fault: ErrorInfo | null;
}

export function finishSampleSize(
  cc: CompiledConjecture,
  plan: SamplePlan,
  outcomes: Map<number, ChunkOutcome>,
  ms: number,
  seed: string,
): SampleSizeOutcome {
  let cases = 0,
    failures = 0,
    skipped = 0;
  let complete = true;
  let failingChunk: number | null = null;
  let fault: ErrorInfo | null = null;
  for (const c of plan.units) {
    const o = outcomes.get(c);
    if (!o) {
      complete = false;
      continue;
    }
    cases += o.cases;
    skipped += o.skipped;
    failures += o.failures;
    if (o.stopped) complete = false;
    if (o.fault) {
      fault = o.fault;
      break;
    }
    if (o.failed) {
      failingChunk = c;
      break;
    }
  }
  const piece: CheckedPiece = {
    phase: 'sample',
    size: { [cc.bindings[cc.sizeIndex].name]: plan.size },
    cases,
    failures,
    skipped,
    ms,
    seed,
  };
  if (plan.shard) piece.shard = shardText(plan.shard);
  if (!complete) piece.partial = true;
  return { piece, complete, failingChunk, fault };
}

export function coveredSamplePiece(cc: CompiledConjecture, plan: SamplePlan, seed: string): CheckedPiece | null {
  const c = plan.covered;
  if (!c) return null;
  const piece: CheckedPiece = {
    phase: 'sample',
    size: { [cc.bindings[cc.sizeIndex].name]: plan.size },
    cases: c.cases,
    failures: 0,
    skipped: c.skipped,
    ms: 0,
    seed,
  };
  if (plan.shard) piece.shard = shardText(plan.shard);
  return piece;
}
