import { it } from 'vitest';
import '../../../src/families/index.js';
import '../../../src/library/index.js';
import { compileConjecture } from '../../../src/language/conjecture/compile-conjecture.js';
import { loadConjectureFile } from '../../../src/language/conjecture/load-file.js';
import { checkConjecture } from '../../../src/runner/check.js';
const base = 'conjecture: c\nfor:\n  n: 1..3\n  w: permutations(n)\n';
const cases: Record<string,string> = {
  big: 'conjecture: c\nfor:\n  n: 1..2\nlet:\n  a: 123456789012345678901234\nclaim: a + 1 == 123456789012345678901235\n',
  bigsample: 'conjecture: c\nfor:\n  n: 1..2\nlet:\n  a: 123456789012345678901234\nclaim: a > 0\nsample:\n  n: 3..4\n  count: 123456789012345678901234\n',
  aliasScalar: base + 'let:\n  a: &A inv(w)\n  b: *A\nclaim: a == b\n',
  aliasMap: 'conjecture: c\nfor: &F\n  n: 1..3\nlet: *F\nclaim: true\n',
  aliasSeq: 'conjecture: c\nindeterminates: &I [q]\nreferences: *I\nfor:\n  n: 1..2\nclaim: true\n',
  aliasAcross: 'define: {f(x): x + 1}\nx: &V 3\n---\nconjecture: c\nfor:\n  n: 1..2\nclaim: f(n) > 0\n',
  emptyclaim: base + 'claim:\n',
  dquoteEsc: base + 'claim: "avoids(w, \\"132\\") and frob(w)"\n',
};
it('p', () => {
  for (const [k, t] of Object.entries(cases)) {
    try { const s = loadConjectureFile('f.yaml', t); const cc = compileConjecture(s.conjectures[0]); const r = checkConjecture(cc, {count: 0}, {}); console.log(k, 'OK', r.outcome, JSON.stringify(r.error), JSON.stringify(s.conjectures[0].document), String(s.conjectures[0].sample?.count)); }
    catch (e: any) { console.log(k, e.name, e.message, JSON.stringify(e.pos), e.snippet, e.suggestion); }
  }
});
