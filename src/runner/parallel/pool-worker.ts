// A worker thread of the pool: compiles the run's conjectures once, then evaluates slices, sample
// chunks and shrinks on request. The interrupt flag is shared memory, so a stop reaches a running
// slice at its next poll.

import { parentPort, workerData } from 'node:worker_threads';
import '../../library/index.js';
import '../../families/index.js';
import type { CompiledConjecture } from '../../language/conjecture/compiled.js';
import { decodeValue } from '../../values/decode.js';
import { setStationaryProgress } from '../../library/markov.js';
import { encodeValue } from '../../values/operations.js';
import { errorInfo, sampleSettingsOf, withSizeOverrides } from '../check.js';
import type { StopReason } from '../hooks.js';
import { DEFAULT_SEED } from '../seeds.js';
import { checkOptionsFor, prepareRun, type RunRequest } from '../session.js';
import type { PoolReply, PoolTask, WireChunk, WireSlice } from './messages.js';
import { sampleCounterexample } from './sample-size.js';
import { openProjectIfAsked } from './worker-setup.js';
import { runSampleChunk, runSlice, type CaseFault, type SampleSettings } from './work-units.js';

const { request, flag } = workerData as { request: RunRequest; flag: Int32Array };
const post = (m: PoolReply) => parentPort!.postMessage(m);

interface Prepared {
  cc: CompiledConjecture;
  sample: SampleSettings;
}

function faultInfo(f: CaseFault | null) {
  return f ? errorInfo(f.error, f.bindings) : null;
}

async function main(): Promise<void> {
  await openProjectIfAsked(request);
  const prepared: Prepared[] = prepareRun(request).map((c) => {
    const opts = checkOptionsFor(request, c, decodeValue);
    const cc = withSizeOverrides(c, opts);
    return { cc, sample: { seed: opts.seed ?? DEFAULT_SEED, ranges: sampleSettingsOf(cc, opts).ranges } };
  });
  let current = -1;
  let lastProgress = 0;
  let lastSolve = 0;
  setStationaryProgress((fraction) => {
    const now = performance.now();
    if (now - lastSolve > 200) {
      lastSolve = now;
      post({ t: 'solve', fraction });
    }
  });
  const control = (task: number, deadline: number | null) => ({
    shouldStop: (): StopReason | null =>
      Atomics.load(flag, 0) !== 0 ? 'interrupt' : deadline !== null && Date.now() > deadline ? 'budget' : null,
    onProgress: (visited: number) => {
      const now = performance.now();
      if (now - lastProgress > 100) {
        lastProgress = now;
        post({ t: 'progress', task, visited });
      }
    },
  });
  parentPort!.on('message', (m: PoolTask) => {
    current = m.task;
    try {
      const { cc, sample } = prepared[m.conj];
      const ctl = control(m.task, m.deadline);
      if (m.t === 'slice') {
        const o = runSlice(cc, m.size, m.lo === null || m.hi === null ? null : [BigInt(m.lo), BigInt(m.hi)], ctl);
        const out: WireSlice = {
          cases: o.cases, failures: o.failures, skipped: o.skipped, ms: o.ms, stopped: o.stopped,
          bestValues: o.best ? o.best.map(encodeValue) : null,
          bestBindings: o.best ? Object.fromEntries(cc.bindings.map((b, i) => [b.name, encodeValue(o.best![i])])) : null,
          fault: faultInfo(o.fault),
        };
        post({ t: 'slice', task: m.task, out });
      } else {
        const o = runSampleChunk(cc, m.size, m.chunk, m.quota, sample, ctl);
        if (m.t === 'chunk') {
          const out: WireChunk = {
            cases: o.cases, failures: o.failures, skipped: o.skipped, ms: o.ms, stopped: o.stopped,
            failed: o.failing !== null, fault: faultInfo(o.fault),
          };
          post({ t: 'chunk', task: m.task, out });
        } else {
          const cx = o.failing ? sampleCounterexample(cc, o.failing, sample.ranges, sample.seed, { shouldStop: ctl.shouldStop }) : null;
          post({ t: 'shrink', task: m.task, out: cx });
        }
      }
    } catch (e) {
      const err = e as Error;
      post({ t: 'crash', task: current, message: err?.message ?? String(e), stack: err?.stack });
    }
  });
  post({ t: 'ready' });
}

main().catch((e) => {
  const err = e as Error;
  post({ t: 'crash', task: null, message: err?.message ?? String(e), stack: err?.stack });
});
