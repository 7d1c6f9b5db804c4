import { it } from 'vitest';
import '../../../src/families/index.js';
import '../../../src/library/index.js';
import { compileConjecture } from '../../../src/language/conjecture/compile-conjecture.js';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
const base = 'conjecture: c\nfor:\n  n: 1..3\n  w: permutations(n)\n';
const cases: Record<string,string> = {
  plain: base + 'claim: inv(w) <= frob(w)\n',
  single: base + "claim: 'inv(w) <= frob(w)'\n",
  double: base + 'claim: "inv(w) <= frob(w)"\n',
  literal: base + 'claim: |\n  inv(w) <=\n    frob(w)\n',
  folded: base + 'claim: >-\n  inv(w) <=\n    frob(w)\n',
  folded2: base + 'claim: >-\n  inv(w)\n  <= frob(w)\n',
  singleEsc: base + "claim: 'w != ''a'' and frob(w)'\n",
  doubleEsc: base + 'claim: "\\t w != 1 and frob(w)"\n',
  plainMulti: base + 'claim: inv(w) <=\n  frob(w)\n',
  let: base + 'let:\n  a: frob(w)\nclaim: a\n',
  where: base + 'where: frob(w)\nclaim: true\n',
  forb: 'conjecture: c\nfor:\n  n: 1..3\n  w: permutatons(n)\nclaim: true\n',
  def: 'define:\n  f(w): frob(w)\n---\n' + base + 'claim: f(w)\n',
  syntax: base + 'claim: inv(w) <= (3 +\n',
  unkkey: base + 'claim: true\nsampel:\n  n: 3..4\n',
  big: 'conjecture: c\nfor:\n  n: 123456789012345678901234..123456789012345678901234\nclaim: n == 123456789012345678901234\n',
};
it('p', () => {
  for (const [k, t] of Object.entries(cases)) {
    try { const s = loadConjectureFile('f.yaml', t); const cc = compileConjecture(s.conjectures[0]); console.log(k, 'OK', JSON.stringify(s.conjectures[0].claim.text)); }
    catch (e: any) { console.log(k, e.name, e.message, JSON.stringify(e.pos), e.snippet, e.suggestion); }
  }
});
