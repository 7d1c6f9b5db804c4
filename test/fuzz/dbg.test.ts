import { test } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { compileConjecture } from '../../src/language/conjecture/compile-conjecture.js';
import { loadConjectureFile } from '../../src/language/conjecture/load-file.js';
import { conjectureFile } from './conjecture-documents.js';
import { seededRand } from './random-source.js';
test('x', () => {
  const m = new Map<string, number>();
  for (let s = 1; s <= 600; s++) {
    const t = conjectureFile(seededRand(s));
    let k = 'OK';
    try { loadConjectureFile('f.yaml', t).conjectures.map(compileConjecture); } catch (e) { k = (e as Error).message.slice(0, 70).replace(/\d+/g, 'N'); if (/unique/.test((e as Error).message) && s < 100) console.log(t, '=>', JSON.stringify((e as any).pos)); }
    m.set(k, (m.get(k) ?? 0) + 1);
  }
  console.log([...m].sort((a, b) => b[1] - a[1]).slice(0, 40).map(([k, v]) => `${v} ${k}`).join('\n'));
});
