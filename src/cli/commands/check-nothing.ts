// No silent pass: a run that would check nothing is an error before it starts (exit 2), the same
// way `--sizes n=5..1` is — an empty size range in a file, a size range none of whose sizes has a
// case, --sizes or --sample naming no binding, a path holding no conjecture. What only the run can
// tell (a family whose emptiness cannot be counted in advance) is reported after it as
// "nothing checked", never as "holds".

import { EvalError, InputError } from '../../base/errors.js';
import { nearest } from '../../base/suggest.js';
import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { sampleSettingsOf, sizesOf } from '../../runner/check-options.js';
import { plannedCases } from '../../runner/plan.js';
import type { ConjectureResult } from '../../runner/result.js';
import { overrides, type RunRequest } from '../../runner/run-request.js';

/** The most random cases per size a conjecture file may ask for. */
export const MAX_FILE_SAMPLE_COUNT = 10_000_000;

export function refuseNothingToCheck(compiled: CompiledConjecture[], req: RunRequest, shownPaths: string[]): void {
  if (compiled.length === 0) {
    const where = shownPaths.length ? shownPaths.join(', ') : 'the conjecture paths';
    throw new InputError(
      `nothing to check: ${where} ${shownPaths.length === 1 ? 'holds' : 'hold'} no conjecture (a document with "conjecture: <id>" and a claim)`,
    );
  }
  for (const [opt, list] of [
    ['--sizes', req.sizes],
    ['--sample', req.sampleRanges],
  ] as const) {
    for (const [name, lo, hi] of list) {
      const names = [...new Set(compiled.flatMap((cc) => cc.bindings.filter((b) => b.source.kind === 'range').map((b) => b.name)))];
      if (!names.includes(name)) {
        const s = nearest(name, names);
        throw new InputError(
          `${opt} ${name}=${lo}..${hi} names no range binding of the conjectures checked${s ? `; did you mean ${s}?` : ''} (their range bindings: ${names.join(', ') || 'none'})`,
          undefined,
          name,
          s,
        );
      }
    }
  }
  const sizeOverrides = overrides(req.sizes);
  for (const cc of compiled) {
    const fileCount = cc.spec.sample?.count ?? null;
    if (fileCount !== null && fileCount > MAX_FILE_SAMPLE_COUNT)
      throw new InputError(
        `${cc.spec.id}: sample count ${fileCount.toLocaleString('en-US')} is more than the ${MAX_FILE_SAMPLE_COUNT.toLocaleString('en-US')} random cases per size a file may ask for`,
        cc.spec.pos,
        String(fileCount),
      );
    if (cc.sizeIndex < 0) continue;
    const b = cc.bindings[cc.sizeIndex];
    if (b.source.kind !== 'range') continue;
    const o = sizeOverrides.get(b.name);
    let sizes: number[];
    try {
      sizes = o ? [] : sizesOf(cc);
    } catch (e) {
      if (e instanceof EvalError || e instanceof InputError) continue; // reported by the run with its position
      throw e;
    }
    if (!o && sizes.length === 0)
      throw new InputError(
        `${cc.spec.id}: the range of ${b.name} is empty (its first bound is above its last), so nothing would be checked`,
        b.pos,
        b.name,
      );
    if (!req.exhaustive) continue;
    let sampling: ReturnType<typeof sampleSettingsOf>;
    try {
      sampling = sampleSettingsOf(cc, { count: req.count ?? undefined, sampleRanges: overrides(req.sampleRanges) });
    } catch (e) {
      if (e instanceof EvalError || e instanceof InputError) continue; // reported by the run with its position
      throw e;
    }
    const { count, ranges } = sampling;
    if (count > 0 && ranges.size > 0) continue;
    const checked = o ? range(o[0], o[1]) : sizes;
    let anyCase = false;
    for (const size of checked) {
      let planned: bigint | null;
      try {
        planned = plannedCases(cc, new Map([[cc.sizeIndex, size]]), true);
      } catch {
        planned = null;
      }
      if (planned !== 0n) {
        anyCase = true;
        break;
      }
    }
    if (!anyCase)
      throw new InputError(
        `${cc.spec.id}: no size ${b.name} = ${checked[0]}..${checked[checked.length - 1]} has any case (the bindings are empty there), so nothing would be checked`,
        b.pos,
        b.name,
      );
  }
}

function range(lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let v = lo; v <= hi; v++) out.push(v);
  return out;
}

/** A result that says "holds" over no case at all. */
export function checkedNothing(r: ConjectureResult): boolean {
  return r.outcome === 'holds' && r.checked.reduce((a, p) => a + p.cases, 0) === 0;
}
