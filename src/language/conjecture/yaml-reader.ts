// Reading conjecture files with the `yaml` library while keeping every node's position, so that an
// error inside an expression points at the line and column of the file, not of the scalar.

import { isMap, isScalar, isSeq, LineCounter, parseAllDocuments, Scalar, YAMLMap, type Document, type Node } from 'yaml';
import { InputError, SourcePos } from '../../base/errors.js';

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
      this.docs = parseAllDocuments(source, { lineCounter: this.lines, uniqueKeys: true, prettyErrors: false }) as Document.Parsed[];
    } catch (e) {
      if (e instanceof RangeError) throw new InputError('the YAML is nested too deeply to read', { file, line: 1, column: 1 });
      throw e;
    }
    if (!Array.isArray(this.docs)) this.docs = [this.docs as unknown as Document.Parsed];
    for (const d of this.docs) {
      const err = d.errors[0];
      if (err) {
        const p = this.pos(err.pos[0]);
        if (/call stack/i.test(err.message)) throw new InputError('the YAML is nested too deeply to read', p);
        const firstLine = err.message.split('\n')[0];
        const line = this.lineText(p.line);
        // The commonest slip: a comprehension's ": " inside a plain YAML value starts a mapping.
        const hint = /\(.*: .*\)/.test(line)
          ? '. A ": " inside an expression starts a YAML mapping: put the expression in quotes (\'...\') or write it as a block (claim: >-, then the expression on the next line)'
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
  exprOf(node: Node, what: string): ExprText {
    if (!isScalar(node)) throw new InputError(`${what} must be an expression (a single line or block of text)`, this.nodePos(node));
    const [start, end] = node.range!;
    const raw = this.source.slice(start, end);
    const text = typeof node.value === 'string' ? node.value : raw.trim();
    return { text, origin: this.originFor(node, raw, text, start), pos: this.pos(start) };
  }

  private originFor(node: Scalar, raw: string, text: string, start: number): Origin {
    const file = this.file;
    const self = this;
    // Each line of the value is found in the source, in order; offsets within a line map directly.
    // This is exact for plain, quoted-without-escapes and literal block scalars, and lands on the
    // right line for folded ones.
    const valueLines = text.split('\n');
    const lineStarts: number[] = [];
    let cursor = 0;
    const quoted = node.type === Scalar.QUOTE_DOUBLE || node.type === Scalar.QUOTE_SINGLE;
    for (const vl of valueLines) {
      const at = vl.length === 0 ? -1 : raw.indexOf(vl, cursor);
      if (at >= 0) {
        lineStarts.push(start + at);
        cursor = at + vl.length;
      } else {
        lineStarts.push(start + (quoted ? 1 : 0) + cursor);
      }
    }
    return {
      file,
      locate(offset: number) {
        let rem = offset;
        for (let i = 0; i < valueLines.length; i++) {
          if (rem <= valueLines[i].length || i === valueLines.length - 1) {
            const p = self.pos(lineStarts[i] + Math.min(rem, valueLines[i].length));
            return { line: p.line, column: p.column };
          }
          rem -= valueLines[i].length + 1;
        }
        const p = self.pos(start);
        return { line: p.line, column: p.column };
      },
    };
  }
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
  if (!isScalar(node) || node.value === null) throw new InputError(`${what} must be a single value`, y.nodePos(node));
  return String(node.value);
}
