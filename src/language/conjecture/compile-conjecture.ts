// Compiling a conjecture spec into closures over a frame (CompiledConjecture): every name, arity
// and type problem is found here, before anything runs.

import { InputError } from '../../base/errors.js';
import type { Expr } from '../expr/ast.js';
import { Compiler, type DefineDecl } from '../expr/index.js';
import { textOrigin } from '../expr/origin.js';
import { parseDefineHeader, parseExpression } from '../expr/parser.js';
import type { BindingSource, CompiledBinding, CompiledConjecture, Fn } from './compiled.js';
import type { TypeName } from '../../values/types.js';
import type { ConjectureSpec } from './conjecture.js';
import { conjectureHash } from './conjecture-hash.js';
import type { ExprText } from './yaml-reader.js';

const COMPARISONS = new Set(['==', '!=', '<', '<=', '>', '>=']);

/**
 * The size binding's exhaustive range may hold at most this many sizes: each size is a piece of
 * work with its own ledger line, and a range of millions of sizes is a slip (a huge bound) that
 * would exhaust memory before anything ran. Large values are for `sample:`.
 */
export const MAX_EXHAUSTIVE_SIZES = 100_000;

/** Refuse a size range with more than MAX_EXHAUSTIVE_SIZES values, when its bounds are constants. */
function checkSizeRange(name: string, lo: Fn, hi: Fn, e: ExprText): void {
  let a: unknown, b: unknown;
  try {
    const frame = new Array(0);
    a = lo(frame);
    b = hi(frame);
  } catch {
    return; // the bounds depend on other bindings, or fail: the runner reports that with the case
  }
  const isInt = (v: unknown): v is number | bigint => typeof v === 'bigint' || Number.isSafeInteger(v);
  if (!isInt(a) || !isInt(b)) return; // not integers: reported by the runner with its own message
  const span = BigInt(b) - BigInt(a) + 1n;
  if (span > BigInt(MAX_EXHAUSTIVE_SIZES))
    throw new InputError(
      `the range of ${name} (${e.text}) has ${span.toLocaleString('en-US')} sizes; ` +
        `an exhaustive range may have at most ${MAX_EXHAUSTIVE_SIZES.toLocaleString('en-US')}. Check large sizes with "sample:" instead`,
      e.pos,
      e.text,
    );
}

function parse(e: ExprText): Expr {
  return parseExpression(e.text, e.origin);
}

export function parseDefines(spec: ConjectureSpec): DefineDecl[] {
  return spec.defines.map((d) => {
    const h = parseDefineHeader(d.header, textOrigin(d.pos.file, d.header, d.pos.line, d.pos.column));
    return { name: h.name, params: h.params, body: parse(d.body), pos: d.pos } as DefineDecl;
  });
}

function sampleBounds(compiler: Compiler, name: string, e: ExprText): { lo: Fn; hi: Fn } {
  const ast = parse(e);
  if (ast.type === 'range') return { lo: compiler.compile(ast.lo).fn, hi: compiler.compile(ast.hi).fn };
  if (ast.type === 'int') {
    const f = compiler.compile(ast).fn;
    return { lo: f, hi: f };
  }
  throw new InputError(`the sample range of ${name} must be a range such as 9..40`, e.pos, e.text);
}

export function compileConjecture(spec: ConjectureSpec): CompiledConjecture {
  const compiler = new Compiler({ file: spec.file, indeterminates: spec.indeterminates, defines: parseDefines(spec) });
  const bindings: CompiledBinding[] = [];
  let sizeIndex = -1;
  for (const b of spec.bindings) {
    const ast = parse(b.source);
    let source: BindingSource;
    let type: TypeName = 'any';
    if (ast.type === 'int') {
      const f = compiler.compile(ast).fn;
      source = { kind: 'range', lo: f, hi: f };
    } else {
      const cs = compiler.compileSource(ast);
      if (cs.kind === 'family') {
        const args = ast.type === 'call' ? ast.args : [];
        source = {
          kind: 'family',
          family: cs.family,
          args: cs.args,
          argNames: args.map((a: Expr) => (a.type === 'name' ? a.name : null)),
        };
        type = cs.elementType;
      } else if (cs.kind === 'range') source = { kind: 'range', lo: cs.lo, hi: cs.hi };
      else source = { kind: 'list', list: cs.fn };
    }
    if (source.kind === 'range') {
      type = 'integer';
      if (sizeIndex < 0) {
        sizeIndex = bindings.length;
        // The raw bounds (the source's own closures refuse a bigint bound with a vaguer message).
        if (ast.type === 'range') checkSizeRange(b.name, compiler.compile(ast.lo).fn, compiler.compile(ast.hi).fn, b.source);
      }
    }
    const slot = compiler.declareSlot(b.name, type);
    bindings.push({ name: b.name, slot, pos: b.pos, source, sample: null });
  }

  if (spec.sample) {
    for (const b of bindings) {
      const e = spec.sample.ranges.get(b.name);
      if (e) {
        if (b.source.kind !== 'range')
          throw new InputError(`sample: ${b.name} is drawn from its family; only range bindings take a sample range`, e.pos, b.name);
        b.sample = sampleBounds(compiler, b.name, e);
      }
    }
    const size = sizeIndex >= 0 ? bindings[sizeIndex] : null;
    if (size && !size.sample && spec.sample.ranges.size > 0)
      throw new InputError(`sample: needs a range for the size ${size.name} (e.g. ${size.name}: 9..40)`, spec.sample.pos);
    if (size && !size.sample)
      throw new InputError(`sample: give the range of sizes to sample, e.g. "${size.name}: 9..40"`, spec.sample.pos, 'sample');
  }

  const where = spec.where ? compiler.compile(parse(spec.where)).fn : null;
  // Each let is declared after it is compiled, so it sees the bindings and the earlier lets only.
  const lets: CompiledConjecture['lets'] = [];
  for (const l of spec.lets) {
    const c = compiler.compile(parse(l.expr));
    const slot = compiler.declareSlot(l.name, c.type);
    lets.push({ name: l.name, fn: c.fn, slot });
  }
  const claimAst = parse(spec.claim);
  const claim = compiler.compile(claimAst);
  if (claim.type !== 'any' && claim.type !== 'boolean')
    throw new InputError(
      `the claim must be true or false, but it is ${claim.type === 'integer' ? 'an' : 'a'} ${claim.type}`,
      spec.claim.pos,
      spec.claim.text,
    );
  const sides: [Fn, Fn] | null =
    claimAst.type === 'binary' && COMPARISONS.has(claimAst.op)
      ? [compiler.compile(claimAst.left).fn, compiler.compile(claimAst.right).fn]
      : null;

  return {
    spec,
    hash: conjectureHash(spec),
    frameSize: compiler.frameSize(),
    bindings,
    sizeIndex,
    where,
    lets,
    claim: claim.fn,
    sides,
  };
}
