// A conjecture compiled to closures over a frame of slots: what the runner executes.

import type { SourcePos } from '../../base/errors.js';
import type { Family } from '../../families/family.js';
import type { ConjectureSpec } from './conjecture.js';

import type { Fn } from '../expr/frame.js';

export type { Fn, Frame } from '../expr/frame.js';

export type BindingSource =
  | { kind: 'range'; lo: Fn; hi: Fn }
  | {
      kind: 'family';
      family: Family<any, any>;
      args: Fn[] /** per argument: the binding name it is, when it is a bare name */;
      argNames: (string | null)[];
    }
  | { kind: 'list'; list: Fn };

export interface CompiledBinding {
  name: string;
  slot: number;
  pos: SourcePos;
  source: BindingSource;
  /** For range bindings with a sample range: its bounds. */
  sample: { lo: Fn; hi: Fn } | null;
}

export interface CompiledLet {
  name: string;
  slot: number;
  fn: Fn;
}

export interface CompiledConjecture {
  spec: ConjectureSpec;
  hash: string;
  frameSize: number;
  bindings: CompiledBinding[];
  /** Index in `bindings` of the size (the first range binding), or -1 when there is none. */
  sizeIndex: number;
  where: Fn | null;
  lets: CompiledLet[];
  claim: Fn;
  /** The operands of the claim's top comparison, when it is one. */
  sides: [Fn, Fn] | null;
}
