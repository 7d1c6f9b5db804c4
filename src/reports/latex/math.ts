// The text form of a value (an expression of the language) typeset as LaTeX mathematics:
// x[1]^2*q - 3/4*z[1, 2] becomes x_{1}^{2} q - \frac{3}{4} z_{1,2}. Works on the text, so every
// value kind that prints as an expression is covered, including ones added later.

interface Tok {
  kind: 'num' | 'frac' | 'ident' | 'op' | 'str' | 'other';
  text: string;
  index?: string;
}

const TOKEN =
  /\s+|(\d+\/\d+)|(\d+)|([A-Za-z_][A-Za-z0-9_]*)(\[[\s\d,-]+\])?|("(?:[^"\\]|\\.)*")|(->|==|!=|<=|>=|\.\.|[-+*/^()[\],<>])|(.)/gy;

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
  '==': ' = ',
  '!=': ' \\neq ',
  '<=': ' \\le ',
  '>=': ' \\ge ',
  '<': ' < ',
  '>': ' > ',
  '->': ' \\mapsto ',
  '..': ' \\ldots ',
  '+': ' + ',
  '-': ' - ',
  '(': '(',
  ')': ')',
  '[': '[',
  ']': ']',
  ',': ', ',
};

function escapeIdent(s: string): string {
  return s.replace(/_/g, '\\_');
}

/** Symmetric functions in their bases print as s_{(2,1)}, m_{(3)}, ... */
const BASIS_LETTER: Record<string, string> = { schurSym: 's', monomialSym: 'm', elementarySym: 'e', completeSym: 'h', powerSym: 'p' };
const BASIS_CALL = /\b(schurSym|monomialSym|elementarySym|completeSym|powerSym)\(\[([\d,\s]*)\]\)/g;

/** An ideal's generators between angle brackets; over F_p with the prime as a subscript. */
const IDEAL_CALL = /^ideal\(\[(.*)\](?:,\s*(\d+))?\)$/s;

/** LaTeX math (without the surrounding $...$) for an expression text. */
export function exprToLatex(text: string): string {
  const ideal = IDEAL_CALL.exec(text.trim());
  if (ideal) return `\\left\\langle ${exprToLatex(ideal[1])} \\right\\rangle${ideal[2] ? `_{\\mathbb{F}_{${ideal[2]}}}` : ''}`;
  const parts = text.split(BASIS_CALL);
  if (parts.length > 1) {
    // split() with two groups: text, name, parts, text, name, parts, ...
    let out = '';
    for (let k = 0; k < parts.length; k += 3) {
      out += parts[k] ? ` ${exprTokensToLatex(parts[k])} ` : '';
      if (k + 1 < parts.length) out += `${BASIS_LETTER[parts[k + 1]]}_{(${parts[k + 2].replace(/\s+/g, '')})}`;
    }
    return out.replace(/\s+/g, ' ').trim();
  }
  return exprTokensToLatex(text);
}

function exprTokensToLatex(text: string): string {
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
