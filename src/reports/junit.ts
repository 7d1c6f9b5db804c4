// The --junit report for CI systems: one test suite per conjecture file, one test case per
// conjecture, failing when the result contradicts its `expect` (the same rule as the exit code).

import type { ConjectureResult } from '../runner/result.js';
import { agreesWithExpectation } from '../runner/result.js';
import { decodeValue } from '../values/decode.js';
import { valueToText } from '../values/operations.js';
import { formatCount } from '../base/format-count.js';
import { xmlEscape } from './markup/xml.js';

export { xmlEscape };

const seconds = (ms: number) => (ms / 1000).toFixed(3); // a timing: the one place floats are fine

function text(x: unknown): string {
  try {
    return valueToText(decodeValue(x));
  } catch {
    return JSON.stringify(x);
  }
}

function coverage(r: ConjectureResult): string {
  const by = (phase: string) => r.checked.filter((p) => p.phase === phase);
  const line = (phase: string, word: string) => {
    const ps = by(phase);
    if (!ps.length) return null;
    const sizes = ps
      .map((p) =>
        Object.entries(p.size)
          .map(([k, v]) => `${k}=${v}`)
          .join(','),
      )
      .filter(Boolean);
    return `${word}: ${formatCount(ps.reduce((a, p) => a + p.cases, 0))} cases${sizes.length ? ` (${sizes[0]}${sizes.length > 1 ? ` .. ${sizes[sizes.length - 1]}` : ''})` : ''}`;
  };
  return [line('exhaustive', 'exhaustive'), line('sample', 'sampled (evidence, not proof)')].filter(Boolean).join('\n');
}

function verdict(r: ConjectureResult): { kind: 'pass' | 'failure' | 'error' | 'skipped'; message: string; body: string } {
  if (agreesWithExpectation(r)) return { kind: 'pass', message: '', body: '' };
  if (r.outcome === 'error') {
    const e = r.error!;
    const where = e.file ? `${e.file}${e.line ? `:${e.line}` : ''}${e.column ? `:${e.column}` : ''}: ` : '';
    const inCase = e.bindings
      ? `\nin the case ${Object.entries(e.bindings)
          .map(([k, v]) => `${k} = ${text(v)}`)
          .join(', ')}`
      : '';
    return { kind: 'error', message: e.message, body: `${where}${e.message}${inCase}` };
  }
  if (r.outcome === 'incomplete') {
    const why = r.stoppedBy === 'interrupt' ? 'interrupted' : 'budget reached';
    return r.expect === 'fails'
      ? { kind: 'failure', message: `incomplete (${why}) before the expected counterexample was found`, body: '' }
      : { kind: 'skipped', message: `incomplete (${why}): no counterexample in what was checked`, body: '' };
  }
  if (r.outcome === 'holds')
    return { kind: 'failure', message: 'expected to fail, but no counterexample was found over the ranges checked', body: '' };
  const c = r.counterexample!;
  const lines = [
    `counterexample (${c.phase}${
      Object.keys(c.size).length
        ? `, ${Object.entries(c.size)
            .map(([k, v]) => `${k} = ${v}`)
            .join(', ')}`
        : ''
    }):`,
    ...Object.entries(c.bindings).map(([k, v]) => `  ${k} = ${c.text?.[k] ?? text(v)}`),
    ...Object.entries(c.values).map(([k, v]) => `  ${k} = ${text(v)}`),
    ...(c.sides ? [`  sides: ${text(c.sides[0])} and ${text(c.sides[1])}`] : []),
  ];
  return {
    kind: 'failure',
    message: `a counterexample to a conjecture expected to ${r.expect === 'open' ? 'be open' : 'hold'}`,
    body: lines.join('\n'),
  };
}

export function junitXml(results: readonly ConjectureResult[]): string {
  const files = new Map<string, ConjectureResult[]>();
  for (const r of results) (files.get(r.file) ?? files.set(r.file, []).get(r.file)!).push(r);
  const count = (rs: readonly ConjectureResult[], kind: string) => rs.filter((r) => verdict(r).kind === kind).length;
  const totalMs = results.reduce((a, r) => a + r.ms, 0);
  let out = '<?xml version="1.0" encoding="UTF-8"?>\n';
  out += `<testsuites name="hunch" tests="${results.length}" failures="${count(results, 'failure')}" errors="${count(results, 'error')}" skipped="${count(results, 'skipped')}" time="${seconds(totalMs)}">\n`;
  for (const [file, rs] of files) {
    out += `  <testsuite name="${xmlEscape(file)}" tests="${rs.length}" failures="${count(rs, 'failure')}" errors="${count(rs, 'error')}" skipped="${count(rs, 'skipped')}" time="${seconds(rs.reduce((a, r) => a + r.ms, 0))}">\n`;
    for (const r of rs) {
      const v = verdict(r);
      out += `    <testcase classname="${xmlEscape(file)}" name="${xmlEscape(r.id)}" time="${seconds(r.ms)}">\n`;
      if (v.kind === 'failure')
        out += `      <failure type="contradicts-expect" message="${xmlEscape(v.message)}">${xmlEscape(v.body)}</failure>\n`;
      if (v.kind === 'error')
        out += `      <error type="evaluation-error" message="${xmlEscape(v.message)}">${xmlEscape(v.body)}</error>\n`;
      if (v.kind === 'skipped') out += `      <skipped message="${xmlEscape(v.message)}"/>\n`;
      const cov = coverage(r);
      out += `      <system-out>${xmlEscape(`expect: ${r.expect}; outcome: ${r.outcome}; hash ${r.hash}${cov ? `\n${cov}` : ''}`)}</system-out>\n`;
      out += '    </testcase>\n';
    }
    out += '  </testsuite>\n';
  }
  return out + '</testsuites>\n';
}
