// The result document of `--json` (CLI.md).

import type { ConjectureResult } from '../runner/result.js';
import { TOOL_VERSION } from '../version.js';

export function resultDocument(results: ConjectureResult[]): unknown {
  return {
    tool: 'hunch',
    version: TOOL_VERSION,
    results: results.map((r) => ({
      id: r.id,
      file: r.file,
      hash: r.hash,
      expect: r.expect,
      outcome: r.outcome,
      checked: r.checked.map((p) => ({
        phase: p.phase,
        size: p.size,
        cases: p.cases,
        failures: p.failures,
        skipped: p.skipped,
        ms: Math.round(p.ms * 10) / 10,
        ...(p.partial ? { partial: true } : {}),
        ...(p.shard ? { shard: p.shard } : {}),
        ...(p.seed !== undefined ? { seed: p.seed } : {}),
      })),
      counterexample: r.counterexample ? (({ text: _text, ...rest }) => rest)(r.counterexample) : null,
      error: r.error,
      ...(r.stoppedBy ? { stoppedBy: r.stoppedBy } : {}),
      ms: Math.round(r.ms * 10) / 10,
    })),
  };
}
