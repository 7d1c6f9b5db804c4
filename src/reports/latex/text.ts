// Plain text made safe for LaTeX: every special character written as the command that prints it
// in the default (OT1) font encoding, control characters dropped, and the few non-ASCII symbols
// the exports use mapped to math, so documents compile with the base TeX system alone.

const SPECIAL: Record<string, string> = {
  '\\': '$\\backslash$',
  '{': '\\{',
  '}': '\\}',
  $: '\\$',
  '&': '\\&',
  '%': '\\%',
  '#': '\\#',
  _: '\\_',
  '^': '\\^{}',
  '~': '\\~{}',
  '<': '$<$',
  '>': '$>$',
  '|': '$|$',
  '×': '$\\times$',
  '≤': '$\\le$',
  '≥': '$\\ge$',
  '→': '$\\to$',
  '–': '--',
  '—': '---',
  '…': '\\dots{}',
  '·': '$\\cdot$',
};

export function latexText(s: string, literal: ReadonlySet<string> = NONE): string {
  let out = '';
  for (const ch of s) {
    const code = ch.codePointAt(0) as number;
    if (code < 0x20 || code === 0x7f) out += code === 0x0a ? ' ' : '';
    else if (literal.has(ch)) out += ch;
    else if (ch in SPECIAL) out += SPECIAL[ch];
    else if (code < 0x80) out += ch;
    else out += '?'; // a letter pdflatex may not have in its default fonts
  }
  return out;
}

const NONE: ReadonlySet<string> = new Set();
/** The typewriter font has these at their ASCII places (the text fonts do not). */
const TYPEWRITER_LITERAL: ReadonlySet<string> = new Set(['<', '>', '|']);

/** Code text: \texttt with the specials escaped. */
export function latexCode(s: string): string {
  return `\\texttt{${latexText(s, TYPEWRITER_LITERAL)}}`;
}
