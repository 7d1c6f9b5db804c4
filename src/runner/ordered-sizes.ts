// One phase as an ordered queue of sizes: units of work (slices or chunks) of the sizes in order are
// handed out one at a time to whoever asks (several may run at once, so a size's last slices can
// overlap the next size's first ones); outcomes may come back in any order, and each size is
// finished in size order once every unit it started has returned — so what a run reports never
// depends on which unit finished first. Synchronous: an executor calls `next` and `accept`.

import type { StopReason } from './hooks.js';

export interface SizeSteps<P, O> {
  /** The plan of the i-th size, or null after the last (it may throw: an error at that size). */
  planAt(i: number): P | null;
  units(plan: P): number[];
  /** After this outcome, no unit of a later size is started (a failure or an error at this size). */
  endsPhase(outcome: O): boolean;
  /** After this outcome, no further unit of its own size is started (an error, a sampled failure). */
  closesSize(outcome: O): boolean;
  stopReason(outcome: O): StopReason | null;
  /** How many cases an outcome counts, for progress. */
  visited(outcome: O): number;
  /**
   * A size whose started units all returned (or, with `final`, the run stopped before they did).
   * Returns true to stop the phase after this size (a failure, an error).
   */
  ready(i: number, plan: P, outcomes: Map<number, O>, ms: number, final: boolean): boolean;
  onProgress?(done: number, plan: P): void;
  shouldStop(): StopReason | null;
}

/** A unit handed out: the size's index, the unit, and an id for its progress. */
export interface SizeTicket {
  i: number;
  unit: number;
  id: number;
}

interface SizeState<P, O> {
  plan: P;
  units: number[];
  outcomes: Map<number, O>;
  started: number;
  returned: number;
  /** No further unit of this size is started. */
  closed: boolean;
  t0: number;
  done: number;
  running: Map<number, number>;
}

export class OrderedSizes<P, O> {
  private readonly sizes: SizeState<P, O>[] = [];
  private exhausted = false;
  /** No unit of a size beyond this one is started or reported. */
  private limit = Infinity;
  private emitted = 0;
  private nextId = 0;
  private planError: { at: number; error: unknown } | null = null;
  /** The error that ends the phase (a size that could not be planned), once reached in order. */
  error: unknown = null;
  failed = false;
  stoppedBy: StopReason | null = null;

  constructor(private readonly s: SizeSteps<P, O>) {}

  /** The next unit to start, or null when no more will be (the phase ends when all started returned). */
  next(): SizeTicket | null {
    if (this.failed || this.stoppedBy) return null;
    const r = this.s.shouldStop();
    if (r) {
      this.stoppedBy = r;
      return null;
    }
    for (;;) {
      const last = this.sizes.length - 1;
      if (last >= 0) {
        const st = this.sizes[last];
        if (!st.closed && st.started < st.units.length) {
          if (last > this.limit) return null;
          return { i: last, unit: st.units[st.started++], id: this.nextId++ };
        }
      }
      if (this.exhausted || this.sizes.length > this.limit) return null;
      let plan: P | null;
      try {
        plan = this.s.planAt(this.sizes.length);
      } catch (e) {
        this.planError = { at: this.sizes.length, error: e };
        this.exhausted = true;
        this.emit();
        return null;
      }
      if (plan === null) {
        this.exhausted = true;
        return null;
      }
      const units = this.s.units(plan);
      this.sizes.push({
        plan,
        units,
        outcomes: new Map(),
        started: 0,
        returned: 0,
        closed: false,
        t0: performance.now(),
        done: 0,
        running: new Map(),
      });
      this.emit(); // a size with nothing to run (resumed) is ready at once
    }
  }

  /** Cases visited so far by a running unit. */
  progress(t: SizeTicket, visited: number): void {
    const st = this.sizes[t.i];
    st.running.set(t.id, visited);
    if (t.i === this.emitted) {
      let running = 0;
      for (const v of st.running.values()) running += v;
      this.s.onProgress?.(st.done + running, st.plan);
    }
  }

  accept(t: SizeTicket, o: O): void {
    const st = this.sizes[t.i];
    st.running.delete(t.id);
    st.outcomes.set(t.unit, o);
    st.returned++;
    st.done += this.s.visited(o);
    const r = this.s.stopReason(o);
    if (r && !this.stoppedBy) this.stoppedBy = r;
    if (this.s.closesSize(o)) st.closed = true;
    if (this.s.endsPhase(o)) this.limit = Math.min(this.limit, t.i);
    if (!this.failed) this.emit();
  }

  /** Finish, in order, every size whose started units have all returned. */
  private emit(): void {
    while (this.emitted < this.sizes.length && this.emitted <= this.limit) {
      const st = this.sizes[this.emitted];
      const expected = st.closed ? st.started : st.units.length;
      if (st.returned < expected) return;
      if (this.s.ready(this.emitted, st.plan, st.outcomes, performance.now() - st.t0, false)) this.limit = this.emitted;
      this.emitted++;
    }
    const pe = this.planError;
    if (pe && this.emitted === pe.at && this.emitted <= this.limit && !this.failed) {
      this.failed = true;
      this.error = pe.error;
    }
  }

  /**
   * Called once every started unit has returned. A stopped run (budget, interrupt) reports the sizes
   * begun but not finished, in order, with what they did.
   */
  end(): void {
    if (!this.failed) this.emit();
    if (this.failed) return;
    for (let i = this.emitted; i < this.sizes.length && i <= this.limit; i++) {
      const st = this.sizes[i];
      if (this.s.ready(i, st.plan, st.outcomes, performance.now() - st.t0, true)) break;
    }
  }
}
