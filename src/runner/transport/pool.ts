// A fixed set of worker threads, one task at a time each. Every worker gets the whole run request
// and compiles the conjectures itself (src/runner/transport/worker-entry.ts); tasks name a
// conjecture by its index in the run and carry one unit of work.

import { Worker } from 'node:worker_threads';
import type { RunRequest } from '../run-request.js';
import type { UnitOutcome, WorkUnit } from '../work/units.js';
import { outcomeFromWire, unitToWire, type PoolReply, type PoolTask, type WireOutcome } from './messages.js';

type Pending = { resolve: (r: WireOutcome) => void; reject: (e: Error) => void; progress?: (visited: number) => void };

export class WorkerCrash extends Error {}

export class WorkerPool {
  private readonly workers: Worker[] = [];
  private readonly pending = new Map<number, Pending>();
  private nextTask = 1;
  private closed = false;
  /** Progress of a long exact solve inside a case (a stationary measure), for the progress line. */
  onSolve: ((fraction: number) => void) | null = null;

  constructor(
    readonly size: number,
    request: RunRequest,
    readonly flag: Int32Array,
  ) {
    for (let i = 0; i < size; i++) {
      const w = new Worker(new URL('./worker-entry.js', import.meta.url), { workerData: { request, flag }, resourceLimits: WORKER_LIMITS });
      w.on('message', (m: PoolReply) => this.receive(m));
      w.on('error', (e) => this.failAll(e.message));
      w.on('exit', (code) => {
        if (!this.closed) this.failAll(`a worker thread stopped unexpectedly (exit code ${code})`);
      });
      this.workers.push(w);
    }
  }

  private readyCount = 0;
  private readyWaiters: Array<() => void> = [];

  /** Resolves when every worker has compiled the run's conjectures (or the pool failed). */
  ready(): Promise<void> {
    if (this.readyCount >= this.size || this.crashed) return Promise.resolve();
    return new Promise((resolve) => this.readyWaiters.push(resolve));
  }

  private wakeReady(): void {
    for (const w of this.readyWaiters.splice(0)) w();
  }

  private receive(m: PoolReply): void {
    if (m.t === 'ready') {
      if (++this.readyCount >= this.size) this.wakeReady();
      return;
    }
    if (m.t === 'solve') {
      this.onSolve?.(m.fraction);
      return;
    }
    if (m.t === 'progress') {
      this.pending.get(m.task)?.progress?.(m.visited);
      return;
    }
    if (m.t === 'crash') {
      const msg = m.message + (process.env.HUNCH_DEBUG && m.stack ? `\n${m.stack}` : '');
      if (m.task === null) this.failAll(msg);
      else this.settle(m.task, null, new WorkerCrash(msg));
      return;
    }
    this.settle(m.task, m.out, null);
  }

  private settle(task: number, r: WireOutcome | null, e: Error | null): void {
    const p = this.pending.get(task);
    if (!p) return;
    this.pending.delete(task);
    if (e) p.reject(e);
    else p.resolve(r!);
  }

  private failAll(message: string): void {
    for (const [task] of this.pending) this.settle(task, null, new WorkerCrash(message));
    this.crashed ??= message;
    this.wakeReady();
  }

  crashed: string | null = null;

  /** Run a unit of conjecture `conj` on the worker of `lane` (lanes beyond the pool's size share workers in turn). */
  runUnit(lane: number, conj: number, unit: WorkUnit, deadline: number | null, progress?: (visited: number) => void): Promise<UnitOutcome> {
    if (this.crashed) return Promise.reject(new WorkerCrash(this.crashed));
    const task = this.nextTask++;
    return new Promise<UnitOutcome>((resolve, reject) => {
      this.pending.set(task, { resolve: (w) => resolve(outcomeFromWire(w)), reject, progress });
      const message: PoolTask = { task, conj, unit: unitToWire(unit), deadline };
      this.workers[lane % this.workers.length].postMessage(message);
    });
  }

  async close(): Promise<void> {
    this.closed = true;
    this.failAll('the run was stopped');
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}

/**
 * Worker threads get a larger young generation: the hot loop allocates small short-lived values
 * (an inverse, a list), and fewer scavenges keep two workers on two cores from spending their time
 * on garbage collection that a single worker leaves to the idle core.
 */
export const WORKER_LIMITS = { maxYoungGenerationSizeMb: 48 };
