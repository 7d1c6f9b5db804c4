// A conjecture as written in its file, before compilation (FORMAT.md §1).

import type { SourcePos } from '../../base/errors.js';
import type { ExprText } from './yaml-reader.js';

/** What a conjecture's author expects: that it holds, that it fails, or nothing (open). */
export type Expectation = 'holds' | 'fails' | 'open';

export interface BindingSpec {
  name: string;
  source: ExprText;
  pos: SourcePos;
}

export interface DefineSpec {
  header: string;
  body: ExprText;
  pos: SourcePos;
}

export interface SampleSpec {
  /** Sample ranges for the range bindings, by name. */
  ranges: Map<string, ExprText>;
  count: number | null;
  pos: SourcePos;
}

export interface ConjectureSpec {
  id: string;
  file: string;
  pos: SourcePos;
  statement: string;
  expect: Expectation;
  indeterminates: string[];
  bindings: BindingSpec[];
  where: ExprText | null;
  lets: Array<{ name: string; expr: ExprText; pos: SourcePos }>;
  claim: ExprText;
  sample: SampleSpec | null;
  references: string[];
  /** The file's `define:` documents and the conjecture's own, in order. */
  defines: DefineSpec[];
  /** The document as plain data (for the hash and for counterexample files). */
  document: Record<string, unknown>;
  /** The file's define documents as plain data. */
  defineDocuments: Record<string, unknown>[];
}

export const CONJECTURE_KEYS = [
  'conjecture',
  'statement',
  'expect',
  'indeterminates',
  'for',
  'where',
  'let',
  'claim',
  'sample',
  'references',
  'define',
] as const;
export const EXPECTATIONS = ['holds', 'fails', 'open'] as const;
