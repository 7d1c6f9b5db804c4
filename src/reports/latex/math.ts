// The text form of a value (an expression of the language) typeset as LaTeX mathematics:
// x[1]^2*q - 3/4*z[1, 2] becomes x_{1}^{2} q - \frac{3}{4} z_{1,2}. Works on the text, so every
// value kind that prints as an expression is covered, including ones added later.

interface Tok {
  kind: 'num' | 'frac' | 'ident' | 'op' | 'str' | 'other';
  text: string;
  index?: string;
}

const TOKEN = /\s+|(\d+\/\d+)|(\d+)|([A-Za-z_][A-Za-z0-9_]*)(\[[\s\d,-]+\])?|("(?:[^"\\]|\\.)*")|(->|==|!=|<=|>=|\.\.|[-+*/^()[\],<>])|(.)/gy;

function tokenize(s: string): Tok[] {
  const out: Tok[] = [];
  TOKEN.lastIndex = 0;
  let m: RegExpExecArray | null;
  while ((m = TOKEN.exec(s)) !== null) {
    if (m[1]) out.push({ kind: 'frac', text: m[1] });
    else if (m[2]) out.push({ kind: 'num', text: m[2] });
    else if (m[3]) out.push({ kind: 'ident', text: m[3], index: m[4] ? m[4].slice(1, -1).replace(/\s+/g, '') : undefined });
    else if (m[5]) out.push({ kind: 'str', text: m[5] });
    else if (m[6]) out.push({ kind: 'op', text: m[6] });
    else if (m[7]) out.push({ kind: 'other', text: m[7] });
    if (TOKEN.lastIndex === m.index) TOKEN.lastIndex++;
  }
  return out;
}

const OPS: Record<string, string> = {
  '==': ' = ', '!=': ' \\neq ', '<=': ' \\le ', '>=': ' \\ge ', '<': ' < ', '>': ' > ', '->': ' \\mapsto ', '..': ' \\ldots ',
  '+': ' + ', '-': ' - ', '(': '(', ')': ')', '[': '[', ']': ']', ',': ', ',
};

function escapeIdent(s: string): string {
  return s.replace(/_/g, '\\_');
}

/** LaTeX math (without the surrounding $...$) for an expression text. */
export function exprToLatex(text: string): string {
  const toks = tokenize(text);
  let out = '';
  for (let i = 0; i < toks.length; i++) {
    const t = toks[i];
    switch (t.kind) {
      case 'num':
        out += t.text.length > 3 ? t.text.replace(/\B(?=(\d{3})+(?!\d))/g, '\\,') : t.text;
        break;
      case 'frac': {
        const [a, b] = t.text.split('/');
        out += `\\frac{${a}}{${b}}`;
        break;
      }
      case 'ident': {
        const next = toks[i + 1];
        const isCall = next && next.kind === 'op' && next.text === '(' && t.index === undefined;
        const name = t.text.length > 1 || isCall ? `\\mathrm{${escapeIdent(t.text)}}` : t.text;
        out += t.index !== undefined ? `${name}_{${t.index}}` : name;
        break;
      }
      case 'str':
        out += `\\texttt{${t.text.slice(1, -1).replace(/[\\{}$&%#_^~]/g, (c) => `\\char\`\\${c}`)}}`;
        break;
      case 'op':
        if (t.text === '*') out += toks[i + 1]?.kind === 'num' || toks[i + 1]?.kind === 'frac' ? ' \\cdot ' : ' ';
        else if (t.text === '/') out += ' / ';
        else if (t.text === '^') {
          // the exponent: a signed number or one token
          let exp = '';
          let j = i + 1;
          if (toks[j]?.text === '-') {
            exp = '-';
            j++;
          }
          exp += toks[j]?.text ?? '';
          out += `^{${exp}}`;
          i = j;
        } else out += OPS[t.text] ?? t.text;
        break;
      default:
        out += t.text === '{' || t.text === '}' ? `\\${t.text}` : t.text;
    }
  }
  return out.replace(/\s+/g, ' ').trim();
}
