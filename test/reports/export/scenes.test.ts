// The LaTeX, SVG and scene text of one object of each kind, pinned as snapshots; plus the
// properties every scene has (items inside its box, a caption) and the escaping rules.

import { describe, expect, it } from 'vitest';
import { sceneOf, SCENE_KINDS } from '../../../src/reports/scenes/index.js';
import { sceneToSvg } from '../../../src/reports/render/svg.js';
import { sceneToTikz } from '../../../src/reports/render/tikz.js';
import { latexText } from '../../../src/reports/latex/text.js';
import { exprToLatex } from '../../../src/reports/latex/math.js';
import { exampleValue, KIND_EXAMPLES } from './kinds.js';

describe('scenes of every object kind', () => {
  it('every kind the exports draw has an example here', () => {
    const covered = new Set(KIND_EXAMPLES.map((k) => (exampleValue(k.text) as { kind: string }).kind));
    for (const kind of SCENE_KINDS) expect(covered.has(kind), kind).toBe(true);
  });

  for (const k of KIND_EXAMPLES) {
    it(`${k.name}: TikZ and SVG as pinned`, () => {
      const scene = sceneOf(exampleValue(k.text), k.hint);
      expect(scene).not.toBeNull();
      expect(scene!.caption.length).toBeGreaterThan(0);
      expect(sceneToTikz(scene!)).toMatchSnapshot('tikz');
      expect(sceneToSvg(scene!)).toMatchSnapshot('svg');
    });

    it(`${k.name}: every item lies inside the scene's box`, () => {
      const s = sceneOf(exampleValue(k.text), k.hint)!;
      const inside = (x: number, y: number) =>
        x >= s.x0 - 1e-9 && x <= s.x0 + s.width + 1e-9 && y >= s.y0 - 1e-9 && y <= s.y0 + s.height + 1e-9;
      for (const i of s.items) {
        if (i.t === 'line') expect(inside(i.x1, i.y1) && inside(i.x2, i.y2)).toBe(true);
        if (i.t === 'rect') expect(inside(i.x, i.y) && inside(i.x + i.w, i.y + i.h)).toBe(true);
        if (i.t === 'dot' || i.t === 'text') expect(inside(i.x, i.y)).toBe(true);
      }
    });
  }

  it('values without a picture have no scene, and oversized objects none either', () => {
    expect(sceneOf(exampleValue('3/4'))).toBeNull();
    expect(sceneOf(exampleValue('perm(reverse(1..60))'))).toBeNull();
  });

  it('the pipe dream caption names the permutation its pipes read', () => {
    // crosses (1,2), (2,1) in the staircase of S_3 read w = 3 2 1... traced by src/reports/pictures/pipeDream.ts
    expect(sceneOf(exampleValue('pipeDream([[1, 1]])'))!.caption).toContain('w = 2 1');
  });
});

describe('LaTeX text and mathematics', () => {
  it('escapes every special character of running text', () => {
    expect(latexText('a_b & 50% #1 {x} $y ~ ^ \\')).toBe('a\\_b \\& 50\\% \\#1 \\{x\\} \\$y \\~{} \\^{} $\\backslash$');
    expect(latexText('tab\there\u0007')).toBe('tabhere');
  });

  it('typesets polynomials, rationals and objects', () => {
    expect(exprToLatex('x[1]^2*q - 3/4*z[1, 2] + 1')).toBe('x_{1}^{2} q - \\frac{3}{4} z_{1,2} + 1');
    expect(exprToLatex('perm([1, 3, 2])')).toBe('\\mathrm{perm}([1, 3, 2])');
    expect(exprToLatex('q^-1 + 2*t')).toBe('q^{-1} + 2 t');
    expect(exprToLatex('1234567')).toBe('1\\,234\\,567');
    expect(exprToLatex('2*schurSym([2, 1]) + q*schurSym([3])')).toBe('2 s_{(2,1)} + q s_{(3)}');
    expect(exprToLatex('ideal([x[1]^2 - x[2], x[1]*x[2]], 32003)')).toBe(
      '\\left\\langle [x_{1}^{2} - x_{2}, x_{1} x_{2}] \\right\\rangle_{\\mathbb{F}_{32003}}'.replace('[', '').replace(']', ''),
    );
  });
});
