// Reading conjecture files with the `yaml` library while keeping every node's position, so that an
// error inside an expression points at the line and column of the file, not of the scalar.

import { isAlias, isMap, isScalar, isSeq, LineCounter, parseAllDocuments, Scalar, YAMLMap, type Document, type Node } from 'yaml';
import { InputError, InputErrors, SourcePos } from '../../base/errors.js';
import { yamlHazards } from './yaml-hazards.js';

/** Maps an offset inside an expression's text to its position in the file. */
export interface Origin {
  file: string;
  locate(offset: number): { line: number; column: number };
}

/** An expression as written in the file. */
export interface ExprText {
  text: string;
  origin: Origin;
  pos: SourcePos;
}

export class YamlFile {
  readonly lines: LineCounter;
  readonly docs: Document.Parsed[];

  constructor(
    readonly file: string,
    readonly source: string,
  ) {
    this.lines = new LineCounter();
    try {
      this.docs = parseAllDocuments(source, {
        lineCounter: this.lines,
        uniqueKeys: true,
        prettyErrors: false,
        intAsBigInt: true,
      }) as Document.Parsed[];
    } catch (e) {
      if (e instanceof RangeError) throw new InputError('the YAML is nested too deeply to read', { file, line: 1, column: 1 });
      throw e;
    }
    if (!Array.isArray(this.docs)) this.docs = [this.docs as unknown as Document.Parsed];
    // Values YAML misreads (a ": " or " #" inside an expression, a reserved first character) are
    // named with their fix, every one of the file at once, before YAML's own first complaint.
    const hazards = yamlHazards(file, source);
    if (hazards.length === 1) throw hazards[0];
    if (hazards.length > 1) throw new InputErrors(hazards);
    for (const d of this.docs) {
      const err = d.errors[0];
      if (err) {
        const p = this.pos(err.pos[0]);
        if (/call stack/i.test(err.message)) throw new InputError('the YAML is nested too deeply to read', p);
        const firstLine = err.message.split('\n')[0];
        const line = this.lineText(p.line);
        // Inside { } (which the hazard scan leaves to YAML) a comprehension's ": " still misleads it.
        const hint = /\(.*: .*\)/.test(line)
          ? '. A ": " inside an expression starts a YAML mapping: write the comprehension body first, sum(q^inv(w) for w in S), which needs no quotes, or put the expression in quotes (\'...\')'
          : '';
        throw new InputError(`YAML syntax: ${firstLine.replace(/ at line \d+, column \d+:?$/, '')}${hint}`, p, line);
      }
    }
  }

  pos(offset: number): SourcePos {
    const { line, col } = this.lines.linePos(offset);
    return { file: this.file, line: Math.max(1, line), column: Math.max(1, col) };
  }

  nodePos(node: Node | null | undefined): SourcePos {
    return this.pos(node?.range?.[0] ?? 0);
  }

  lineText(line: number): string {
    return this.source.split('\n')[line - 1] ?? '';
  }

  /**
   * The text of a scalar node as an expression, with an origin that maps offsets in that text to
   * file positions. Numbers and booleans keep their source spelling (so a 30-digit integer stays
   * exact: YAML itself would read it as a float).
   */
  /** An alias of a single value stands for that value (its text and position are the anchor's). */
  deref(node: Node | null): Node | null {
    if (!isAlias(node)) return node;
    for (const d of this.docs) {
      const t = node.resolve(d);
      if (t) return t as Node;
    }
    return node;
  }

  exprOf(node: Node, what: string): ExprText {
    node = this.deref(node)!;
    if (!isScalar(node)) throw new InputError(`${what} must be an expression (a single line or block of text)`, this.nodePos(node));
    const [start, end] = node.range!;
    const raw = this.source.slice(start, end);
    const text = typeof node.value === 'string' ? node.value : raw.trim();
    return { text, origin: this.originFor(node, raw, text, start), pos: this.pos(start) };
  }

  private originFor(node: Scalar, raw: string, text: string, start: number): Origin {
    const map = alignValueToSource(text, raw, node.type === Scalar.QUOTE_DOUBLE, node.type === Scalar.QUOTE_SINGLE);
    const self = this;
    return {
      file: this.file,
      locate(offset: number) {
        const i = Math.max(0, Math.min(offset, map.length - 1));
        const p = self.pos(start + map[i] + Math.max(0, offset - (map.length - 1)));
        return { line: p.line, column: p.column };
      },
    };
  }
}

/**
 * For each offset of a scalar's value (and one past its end), the offset in its source text.
 * The value and the source are walked together: equal characters map to each other; a folded
 * line break (a space or newline in the value) stands for a newline and the next line's
 * indentation in the source; an escape (double quotes) or a doubled quote (single quotes) is
 * one character of the value; anything else in the source (block headers, indentation, quotes)
 * is skipped.
 */
export function alignValueToSource(value: string, raw: string, doubleQuoted: boolean, singleQuoted: boolean): number[] {
  const map: number[] = new Array(value.length + 1);
  let r = 0;
  for (let i = 0; i < value.length; i++) {
    const c = value[i];
    // Skip what the value does not contain: block headers, indentation, opening quotes.
    while (r < raw.length && raw[r] !== c) {
      if (doubleQuoted && raw[r] === '\\') break;
      if ((c === ' ' || c === '\n') && raw[r] === '\n') break;
      r++;
    }
    map[i] = Math.min(r, raw.length);
    if (r >= raw.length) continue;
    if (raw[r] === c) {
      if (singleQuoted && c === "'" && raw[r + 1] === "'") r += 2;
      else r++;
    } else if (doubleQuoted && raw[r] === '\\') {
      const e = raw[r + 1];
      r += e === 'x' ? 4 : e === 'u' ? 6 : e === 'U' ? 10 : 2;
    } else if (raw[r] === '\n') {
      // A folded line break: the newline and the next line's indentation.
      r++;
      while (r < raw.length && (raw[r] === ' ' || raw[r] === '\t')) r++;
    }
  }
  map[value.length] = Math.min(r, raw.length);
  return map;
}

/** The entries of a mapping node in order, with their key text. */
export function mapEntries(y: YamlFile, node: Node | null, what: string): Array<{ key: string; keyNode: Node; value: Node | null }> {
  if (!isMap(node)) throw new InputError(`${what} must be a mapping of names to values`, y.nodePos(node));
  return (node as YAMLMap<Node, Node | null>).items.map((pair) => {
    const k = pair.key as Node;
    if (!isScalar(k)) throw new InputError(`${what}: keys must be plain names`, y.nodePos(k));
    return { key: String(k.value), keyNode: k, value: pair.value ?? null };
  });
}

export function seqItems(y: YamlFile, node: Node | null, what: string): Node[] {
  if (!isSeq(node)) throw new InputError(`${what} must be a list`, y.nodePos(node));
  return node.items as Node[];
}

export function scalarString(y: YamlFile, node: Node | null, what: string): string {
  node = y.deref(node);
  if (!isScalar(node) || node.value === null) throw new InputError(`${what} must be a single value`, y.nodePos(node));
  return String(node.value);
}
