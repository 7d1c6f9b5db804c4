// Driving one phase over a pool: units of work (slices or chunks) of the sizes in order are handed to
// whichever lane is free, so a size's last slices overlap the next size's first ones; results are
// taken back in size order, so what a run reports never depends on which lane finished first.

import type { StopReason } from '../hooks.js';

export interface PhaseSteps<P, O> {
  /** The plan of the i-th size, or null after the last (it may throw: an error at that size). */
  planAt(i: number): P | null;
  units(plan: P): number[];
  /** Run a unit on a lane; progress reports cases visited so far in it. */
  dispatch(lane: number, plan: P, unit: number, progress: (visited: number) => void): Promise<O>;
  stopReason(outcome: O): StopReason | null;
  /**
   * A size whose units all returned (or, with `final`, the run stopped before they did). Returns
   * true to stop the phase after this size (a failure, an error).
   */
  ready(i: number, plan: P, outcomes: Map<number, O>, ms: number, final: boolean): boolean;
  onProgress?(done: number, plan: P): void;
  shouldStop(): StopReason | null;
  /** How many cases an outcome counts, for progress. */
  visited(outcome: O): number;
}

interface SizeState<P, O> {
  plan: P;
  units: number[];
  outcomes: Map<number, O>;
  returned: number;
  t0: number;
  done: number;
  running: Map<number, number>;
}

export interface PhaseRun {
  stoppedBy: StopReason | null;
}

export async function runOrderedPhase<P, O>(lanes: number, s: PhaseSteps<P, O>): Promise<PhaseRun> {
  const sizes: SizeState<P, O>[] = [];
  let planned = 0; // sizes planned so far
  let unitAt = 0; // next unit within sizes[planned - 1]
  let exhausted = false;
  let limit = Infinity; // no unit of a size beyond this one is started or reported
  let emitted = 0;
  let stoppedBy: StopReason | null = null;
  let failure: unknown = null;
  let failed = false;
  let planError: { at: number; error: unknown } | null = null;

  const tryEmit = () => {
    while (emitted < sizes.length && emitted <= limit) {
      const st = sizes[emitted];
      if (st.returned < st.units.length) return;
      if (s.ready(emitted, st.plan, st.outcomes, performance.now() - st.t0, false)) limit = emitted;
      emitted++;
    }
    if (planError && emitted === planError.at && emitted <= limit && !failed) {
      failed = true;
      failure = planError.error;
    }
  };

  let taskSeq = 0;
  const next = (): { i: number; j: number } | null => {
    if (failed || stoppedBy) return null;
    const r = s.shouldStop();
    if (r) {
      stoppedBy = r;
      return null;
    }
    for (;;) {
      if (planned > 0 && unitAt < sizes[planned - 1].units.length) {
        const i = planned - 1;
        if (i > limit) return null;
        return { i, j: sizes[i].units[unitAt++] };
      }
      if (exhausted || planned > limit) return null;
      let plan: P | null;
      try {
        plan = s.planAt(planned);
      } catch (e) {
        planError = { at: planned, error: e };
        exhausted = true;
        tryEmit();
        return null;
      }
      if (plan === null) {
        exhausted = true;
        return null;
      }
      sizes.push({ plan, units: s.units(plan), outcomes: new Map(), returned: 0, t0: performance.now(), done: 0, running: new Map() });
      planned++;
      unitAt = 0;
      tryEmit(); // a size with nothing to run (resumed) is ready at once
    }
  };

  const lane = async (k: number) => {
    for (;;) {
      const u = next();
      if (!u) return;
      const st = sizes[u.i];
      const id = taskSeq++;
      const progress = (v: number) => {
        st.running.set(id, v);
        if (u.i === emitted) s.onProgress?.(st.done + [...st.running.values()].reduce((a, b) => a + b, 0), st.plan);
      };
      let o: O;
      try {
        o = await s.dispatch(k, st.plan, u.j, progress);
      } catch (e) {
        if (!failed) {
          failed = true;
          failure = e;
        }
        return;
      }
      st.running.delete(id);
      st.outcomes.set(u.j, o);
      st.returned++;
      st.done += s.visited(o);
      const r = s.stopReason(o);
      if (r && !stoppedBy) stoppedBy = r;
      if (!failed) tryEmit();
    }
  };

  await Promise.all(Array.from({ length: lanes }, (_, k) => lane(k)));
  if (failed) throw failure;
  tryEmit();
  if (failed) throw failure;
  // Stopped (budget, interrupt): the sizes begun but not finished, in order, with what they did.
  for (let i = emitted; i < sizes.length && i <= limit; i++) {
    const st = sizes[i];
    if (s.ready(i, st.plan, st.outcomes, performance.now() - st.t0, true)) break;
  }
  return { stoppedBy };
}
