// How `hunch guess` (and the line under `hunch table`) shows guesses: ranked, each with the terms
// that found it and those that confirm it, and, when nothing fits, what was tried on how many terms.

import { MIN_CONFIRMING_TERMS, type Guess, type GuessReport } from '../algebra/guessing/index.js';
import { evidenceText } from './guess-conjecture.js';

export const GUESS_CAVEAT =
  'Guesses agree with every term given; that proves nothing beyond those terms. Write them as conjectures (--write FILE) and check them on more.';

function terms(k: number): string {
  return k === 1 ? '1 term' : `${k} terms`;
}

export function formatGuesses(report: GuessReport, header: string, dim: (s: string) => string = (s) => s): string {
  let out = '';
  if (report.guesses.length === 0) {
    out += `No guess fits ${header} (${terms(report.terms)}, n = ${report.offset}..${report.offset + report.terms - 1}).\n`;
    out += `Tried, each class needing ${MIN_CONFIRMING_TERMS} terms beyond those that determine a guess:\n`;
    for (const t of report.tried) out += `  - ${t.guessClass}${t.extent ? `: ${t.extent}` : ''} (${terms(t.terms)})\n`;
    if (report.tried.length === 0) out += `  nothing: ${terms(report.terms)} ${report.terms === 1 ? 'is' : 'are'} too few for any class\n`;
    return out;
  }
  out += `Guesses for ${header}, simplest first:\n`;
  report.guesses.forEach((g, i) => {
    out += `\n${i + 1}. ${g.title}\n`;
    out += `   ${g.formula}\n`;
    for (const n of g.notes) out += `   ${n}\n`;
    out += `   ${evidenceText(g)}\n`;
  });
  out += '\n' + dim(`(${GUESS_CAVEAT})`) + '\n';
  return out;
}

/** One line for the foot of a table whose variable is `name`. */
export function bestGuessLine(g: Guess, name: string): string {
  const a = name === 'n' ? 'a(n) the value' : `a(n) the value at ${name} = n`;
  return `Best guess, with ${a}: ${g.formula}  (${g.title}; ${evidenceText(g)})`;
}

export function guessJson(g: Guess, rank: number): Record<string, unknown> {
  return {
    rank,
    kind: g.kind,
    title: g.title,
    formula: g.formula,
    notes: g.notes,
    unknowns: g.unknowns,
    ...(g.transform ? { transform: g.transform } : {}),
    evidence: {
      foundFrom: [g.evidence.from, g.evidence.determinedTo],
      confirmedBy: [g.evidence.determinedTo + 1, g.evidence.confirmedTo],
    },
  };
}

export function guessReportJson(report: GuessReport): Record<string, unknown> {
  return {
    offset: report.offset,
    terms: report.terms,
    minConfirmingTerms: MIN_CONFIRMING_TERMS,
    guesses: report.guesses.map((g, i) => guessJson(g, i + 1)),
    tried: report.tried,
  };
}
