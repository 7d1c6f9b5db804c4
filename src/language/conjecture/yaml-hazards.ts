// Finding, line by line, the places where YAML would misread an expression (or a prose value)
// written as a plain value (FORMAT.md §3.1): a ": " (YAML starts a mapping), a " #" (YAML starts a
// comment, cutting the expression), or a first character YAML reserves ([ { * & ! | > % @ ` "- "
// and a quote that closes before the value ends). Each hazard is one message at its line and
// column naming the cause and the fix, and every hazard of the file is found in one pass.
//
// The scan knows just enough of YAML's block layout to tell which values are expressions: claim
// and where, and the entries of let, for, define and sample (except sample's count); prose is the
// statement and the references. Values in flow collections ({ a: ..., b: ... }) and block scalars
// (claim: >-) are left alone: in the first YAML's own message stands, the second has no hazards.

import { InputError } from '../../base/errors.js';
import { textOrigin } from '../expr/origin.js';
import { parseExpression } from '../expr/parser.js';
import { bodyFirstText } from '../expr/rewrite.js';

type Role = 'expression' | 'prose' | 'other';

const EXPRESSION_KEYS = new Set(['claim', 'where']);
const PARENTS_OF_EXPRESSIONS = new Set(['let', 'for', 'define', 'sample']);

/** What a key's value is, given the key above it (null at the top of a document). */
function roleOf(key: string, parent: string | null): Role {
  if (parent === null) return EXPRESSION_KEYS.has(key) ? 'expression' : key === 'statement' ? 'prose' : 'other';
  if (PARENTS_OF_EXPRESSIONS.has(parent)) return parent === 'sample' && key === 'count' ? 'other' : 'expression';
  return 'other';
}

/** A block-mapping entry `key: value`, possibly after sequence dashes: indent, key, value column. */
const ENTRY = /^( *)((?:- +)*)([^\s'"#?:,[\]{}&*!|>%@`-][^#]*?|"(?:[^"\\]|\\.)*"|'(?:[^']|'')*')[ \t]*:(?=[ \t]|$)[ \t]*(.*)$/;
const ITEM = /^( *)- +(.*)$/;
const BLOCK_HEADER = /^[|>][-+0-9]*[ \t]*(#.*)?$/;

/** What YAML does with a plain value that starts with this character. */
const FIRST_CHARACTER: Record<string, string> = {
  '[': 'reads a value that starts with [ as a list',
  '{': 'reads a value that starts with { as a mapping',
  '*': 'reads a value that starts with * as an alias (a reference to an &anchor)',
  '&': 'reads a value that starts with & as an anchor name',
  '!': 'reads a value that starts with ! as a tag',
  '|': 'reads a value that starts with | as the header of a block of text, which begins on the next line',
  '>': 'reads a value that starts with > as the header of a block of text, which begins on the next line',
  '%': 'does not allow a plain value to start with %',
  '@': 'reserves @, so a plain value cannot start with it',
  '`': 'reserves the backquote, so a plain value cannot start with it',
};

interface Entry {
  indent: number;
  key: string;
}

interface Value {
  role: Role;
  /** What to call it in a message: "claim", "let a", "the statement". */
  name: string;
  /** The key as written, for the fix (`claim: '...'`). */
  key: string;
  /** The value's text on its first line and its 0-based column there. */
  text: string;
  column: number;
  line: number;
}

/** Quote a text for YAML in single quotes. */
function quoted(text: string): string {
  return `'${text.replace(/'/g, "''")}'`;
}

/** The position of a YAML comment in a plain value (" #" or a tab before #), or -1. */
function commentAt(text: string): number {
  for (let i = 1; i < text.length; i++) if (text[i] === '#' && (text[i - 1] === ' ' || text[i - 1] === '\t')) return i - 1;
  return text.startsWith('#') ? 0 : -1;
}

/** Whether an expression cut here is obviously unfinished: an open bracket or string, or a trailing operator. */
function unfinished(text: string): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (inString) {
      if (c === '\\') i++;
      else if (c === '"') inString = false;
    } else if (c === '"') inString = true;
    else if (c === '(' || c === '[') depth++;
    else if (c === ')' || c === ']') depth--;
  }
  return inString || depth > 0 || /(\band|\bor|\bnot|\bimplies|\biff|\bin|\bfor|\bwhere|\bif|\bthen|\belse|[-+*/^,=<>.]|->)\s*$/.test(text);
}

/** The body-first rewrite of an expression when it has binder-first comprehensions, else null. */
function bodyFirstFix(text: string): string | null {
  try {
    const e = parseExpression(text, textOrigin('', text));
    const t = bodyFirstText(text, e);
    return t !== text && !/: | #|^[[{*&!|>%@`'"]|^- /.test(t) ? t : null;
  } catch {
    return null;
  }
}

export class HazardScanner {
  readonly found: InputError[] = [];
  private readonly lines: string[];

  constructor(
    private readonly file: string,
    source: string,
  ) {
    this.lines = source.split(/\r?\n/);
  }

  private report(line: number, column: number, message: string, suggestion: string): void {
    this.found.push(new InputError(message, { file: this.file, line: line + 1, column: column + 1 }, this.lines[line].trim(), suggestion));
  }

  /** Every hazard of the file, in line order. */
  scan(): InputError[] {
    const stack: Entry[] = [];
    for (let i = 0; i < this.lines.length; i++) {
      const line = this.lines[i];
      if (/^(---|\.\.\.)(\s|$)/.test(line)) {
        stack.length = 0;
        continue;
      }
      if (/^\s*(#.*)?$/.test(line)) continue;
      const m = ENTRY.exec(line);
      let indent: number, key: string | null, text: string, column: number;
      if (m) {
        indent = m[1].length + m[2].length;
        key = m[3].replace(/^['"]|['"]$/g, '');
        text = m[4];
        column = line.length - m[4].length;
      } else {
        const it = ITEM.exec(line);
        if (!it) continue; // a continuation line of a value handled below, or something YAML will report
        indent = it[1].length;
        key = null;
        text = it[2];
        column = line.length - it[2].length;
      }
      if (m && m[2] && key !== null) {
        // `- a: b` under references is a reference text that YAML would read as a mapping.
        const it = ITEM.exec(line)!;
        const below = stack.filter((e) => e.indent <= it[1].length);
        if (below.length && below[below.length - 1].key === 'references') {
          key = null;
          indent = it[1].length;
          text = it[2];
          column = line.length - it[2].length;
        }
      }
      while (stack.length && stack[stack.length - 1].indent >= indent && (key !== null || stack[stack.length - 1].indent > indent))
        stack.pop();
      const parent = stack.length ? stack[stack.length - 1].key : null;
      if (key === null) {
        // A list item: prose under references, else not ours.
        if (parent === 'references') i = this.value({ role: 'prose', name: 'a reference', key: '-', text, column, line: i }, indent);
        continue;
      }
      stack.push({ indent, key });
      const role = roleOf(key, parent);
      if (role === 'other') continue;
      const name = parent === null ? (key === 'statement' ? 'the statement' : key) : `${parent === 'for' ? 'the binding' : parent} ${key}`;
      i = this.value({ role, name, key, text, column, line: i }, indent);
    }
    return this.found;
  }

  /** Checks one value (and its continuation lines); returns the index of its last line. */
  private value(v: Value, keyIndent: number): number {
    const { text } = v;
    const fixQuoted = (t: string) => `${v.key === '-' ? '-' : `${v.key}:`} ${quoted(t)}`;
    const what = v.role === 'prose' ? `${v.name} is prose, and YAML` : `${v.name} is an expression, and YAML`;
    // Continuation lines: more indented than the key, up to the next line that is not.
    let last = v.line;
    while (last + 1 < this.lines.length) {
      const next = this.lines[last + 1];
      if (/^\s*$/.test(next)) break;
      const ind = next.length - next.trimStart().length;
      if (ind <= keyIndent) break;
      last++;
    }
    if (text === '') {
      // A value on the lines below (a multi-line plain value) is checked line by line.
      return this.continuation(v, v.line + 1, last, what, fixQuoted);
    }
    const first = text[0];
    if (BLOCK_HEADER.test(text)) return last; // a block scalar: nothing inside is special
    if (first === '"' || first === "'") return this.quotedValue(v, last, what);
    if (text.startsWith('- ') || text === '-') {
      this.report(
        v.line,
        v.column,
        `${what} reads a value that starts with "- " as a list item`,
        v.role === 'prose'
          ? `put the text in quotes: ${fixQuoted(text)}`
          : `write -(...) without the space, or quote it: ${fixQuoted(text)}`,
      );
      return last;
    }
    if (FIRST_CHARACTER[first] && !this.intended(text, last, v)) {
      const whole = this.joined(v, last);
      const fix = `put the ${v.role === 'prose' ? 'text' : 'expression'} in quotes: ${fixQuoted(whole)}`;
      const hint = first === '!' && v.role === 'expression' ? `the language writes negation as not; or ${fix}` : fix;
      this.report(v.line, v.column, `${what} ${FIRST_CHARACTER[first]}`, hint);
      return last;
    }
    this.plainLine(v, v.line, text, v.column, last, what, fixQuoted);
    return last;
  }

  /**
   * Whether a reserved first character is YAML used on purpose: an anchor `&a inv(w)`, an alias
   * `*a` to an anchor of the file, a tag `!!str ...`, or a list or mapping left unclosed (a YAML
   * syntax slip that YAML's own message describes better).
   */
  private intended(text: string, last: number, v: Value): boolean {
    const c = text[0];
    if (c === '&') return /^&[A-Za-z0-9_-]+\s+\S/.test(text);
    if (c === '*') {
      const m = /^\*([A-Za-z0-9_-]+)\s*(#.*)?$/.exec(text);
      return m !== null && this.lines.some((l) => l.includes(`&${m[1]} `) || l.endsWith(`&${m[1]}`));
    }
    if (c === '!') return /^!!?[A-Za-z]+\s/.test(text) && !/^!\w+\(/.test(text);
    if (c === '[' || c === '{') {
      const whole = this.joined(v, last);
      let depth = 0;
      for (const ch of whole) {
        if (ch === '[' || ch === '{') depth++;
        else if (ch === ']' || ch === '}') depth--;
      }
      return depth > 0;
    }
    return false;
  }

  /** The whole value of lines first..last as YAML would fold it (for a quoted fix). */
  private joined(v: Value, last: number): string {
    const parts = [v.text];
    for (let k = v.line + 1; k <= last; k++) parts.push(this.lines[k].trim());
    return parts.join(' ').replace(/\s+#.*$/, '');
  }

  private continuation(v: Value, from: number, last: number, what: string, fixQuoted: (t: string) => string): number {
    if (from > last) return last;
    const line = this.lines[from];
    const col = line.length - line.trimStart().length;
    const text = line.trimStart();
    if (BLOCK_HEADER.test(text) || text[0] === '"' || text[0] === "'") return last;
    this.plainLine({ ...v, text, line: from, column: col }, from, text, col, last, what, fixQuoted);
    return last;
  }

  /** A plain value's first line and continuation lines: ": " and " #". */
  private plainLine(
    v: Value,
    lineNo: number,
    text: string,
    column: number,
    last: number,
    what: string,
    fixQuoted: (t: string) => string,
  ): void {
    const segments: Array<[number, string, number]> = [[lineNo, text, column]];
    for (let k = lineNo + 1; k <= last; k++) {
      const l = this.lines[k];
      segments.push([k, l.trimStart(), l.length - l.trimStart().length]);
    }
    let sofar = '';
    for (let s = 0; s < segments.length; s++) {
      const [ln, seg, col] = segments[s];
      const hash = commentAt(seg);
      const body = hash >= 0 ? seg.slice(0, hash) : seg;
      const colon = body.search(/:( |\t|$)/);
      if (colon >= 0) {
        const whole = this.valueText(segments);
        if (v.role === 'prose') {
          this.report(
            ln,
            col + colon,
            `${what} reads the ": " in it as the start of a mapping`,
            `put the text in quotes: ${fixQuoted(whole)}`,
          );
        } else {
          const fix = bodyFirstFix(whole);
          this.report(
            ln,
            col + colon,
            `${what} reads the ": " in it as the start of a mapping`,
            fix
              ? `write the comprehension body first, which needs no quotes: ${v.key}: ${fix}`
              : `put the expression in quotes: ${fixQuoted(whole)}`,
          );
        }
        return;
      }
      sofar += (sofar ? ' ' : '') + body.trim();
      if (hash >= 0 && v.role === 'expression') {
        const more = s + 1 < segments.length;
        if (more || unfinished(sofar)) {
          this.report(
            ln,
            col + hash + (seg[hash] === '#' ? 0 : 1),
            `${what} reads " #" as the start of a comment, so the expression stops here: ${sofar}`,
            more
              ? 'put the comment after the whole expression, on its last line or a line of its own'
              : 'remove the comment from the middle of the expression (the language has no #), or put the expression in quotes',
          );
        }
        return;
      }
    }
  }

  /** The value across segments, up to a comment (for quoted fixes). */
  private valueText(segments: Array<[number, string, number]>): string {
    const parts: string[] = [];
    for (const [, seg] of segments) {
      const h = commentAt(seg);
      parts.push((h >= 0 ? seg.slice(0, h) : seg).trim());
      if (h >= 0) break;
    }
    return parts.join(' ');
  }

  /** A value that starts with a quote must end with it: `claim: "132" == s` is YAML's string "132" and then junk. */
  private quotedValue(v: Value, last: number, what: string): number {
    const q = v.text[0];
    // Find the closing quote, possibly on a later line.
    let ln = v.line;
    let seg = v.text;
    let col = v.column;
    let k = 1;
    for (;;) {
      for (; k < seg.length; k++) {
        if (q === '"' && seg[k] === '\\') {
          k++;
          continue;
        }
        if (seg[k] === q) {
          if (q === "'" && seg[k + 1] === "'") {
            k++;
            continue;
          }
          const rest = seg.slice(k + 1);
          if (!/^\s*(#.*)?$/.test(rest)) {
            const whole = this.joined(v, last);
            this.report(
              ln,
              col + k + 1 + (rest.length - rest.trimStart().length),
              `${what} reads a value that starts with a quote as a quoted text that ends at its closing quote, so "${rest.trim()}" is left over`,
              `put the whole ${v.role === 'prose' ? 'text' : 'expression'} in quotes: ${v.key === '-' ? '-' : `${v.key}:`} ${q === '"' ? quoted(whole) : `"${whole.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`}`,
            );
          }
          return Math.max(ln, v.line);
        }
      }
      if (ln + 1 >= this.lines.length) return ln; // never closed: YAML reports it
      ln++;
      seg = this.lines[ln];
      col = 0;
      k = 0;
    }
  }
}

/** Every YAML hazard of a file (empty when there is none). */
export function yamlHazards(file: string, source: string): InputError[] {
  return new HazardScanner(file, source).scan();
}
