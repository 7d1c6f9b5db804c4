// Suite-wide check of the registries (LIBRARY.md, "Every entry is registered once, with its
// signature, a one-line description, an example and the published source"): every function's
// example evaluates to exactly its stated value, every family's example evaluates, and every entry
// has a description and a source. Each entry is its own test, so a failure names it.

import { describe, expect, it } from 'vitest';
import '../../src/families/index.js';
import '../../src/library/index.js';
import { allFamilies } from '../../src/families/registry.js';
import { evaluate } from '../../src/language/expr/index.js';
import { allFunctions } from '../../src/library/registry.js';
import { valueToText } from '../../src/values/operations.js';

const INDETERMINATES = ['q', 'x', 'y', 't'];

function textOf(example: string): string {
  return valueToText(evaluate(example, [], INDETERMINATES));
}

describe('every registered function', () => {
  it('the registry is not empty', () => {
    expect(allFunctions().length).toBeGreaterThan(50);
  });
  for (const f of allFunctions()) {
    it(`${f.name}: ${f.example} gives ${f.exampleValue}`, () => {
      expect(f.description.trim(), `${f.name} has no description`).not.toBe('');
      expect(f.source.trim(), `${f.name} has no source`).not.toBe('');
      expect(f.example.trim(), `${f.name} has no example`).not.toBe('');
      let got: string;
      try {
        got = textOf(f.example);
      } catch (e) {
        throw new Error(`${f.name}: the example ${f.example} fails: ${(e as Error).message}`);
      }
      expect(got, `${f.name}: ${f.example}`).toBe(f.exampleValue);
    });
  }
});

describe('every registered family', () => {
  it('the registry is not empty', () => {
    expect(allFamilies().length).toBeGreaterThanOrEqual(10);
  });
  for (const fam of allFamilies()) {
    it(`${fam.name}: ${fam.example} evaluates`, () => {
      expect(fam.description.trim(), `${fam.name} has no description`).not.toBe('');
      expect(fam.source.trim(), `${fam.name} has no source`).not.toBe('');
      expect(fam.signature.startsWith(fam.name + '('), `${fam.name}: signature ${fam.signature}`).toBe(true);
      let got: string;
      try {
        got = textOf(fam.example);
      } catch (e) {
        throw new Error(`${fam.name}: the example ${fam.example} fails: ${(e as Error).message}`);
      }
      expect(got.length).toBeGreaterThan(0);
    });
  }
});
