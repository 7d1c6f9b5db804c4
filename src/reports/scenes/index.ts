// The scene (geometry) of a value, for the LaTeX, SVG and HTML exports. Reads the same object
// fields as the terminal pictures (src/reports/pictures/index.ts names them); values without a
// picture (numbers, polynomials, ...) give null.

import { isStructured } from '../../values/structured.js';
import { valueToText } from '../../values/operations.js';
import type { Value } from '../../values/value.js';
import { pipeExits } from '../pictures/pipeDream.js';
import { MAX_SIDE } from '../pictures/index.js';
import { matchingScene, setPartitionScene } from './arcs.js';
import { compositionScene, partitionScene, tableauScene } from './diagrams.js';
import { asmScene, matrixScene, permutationScene, pipeDreamScene, signedPermutationScene } from './grids.js';
import { dyckPathScene, motzkinPathScene } from './paths.js';
import type { Scene } from './scene.js';
import { parkingFunctionScene, subsetScene, wiringScene, wordScene } from './strips.js';

export type { Scene, Item, Tone } from './scene.js';

export interface SceneHint {
  /** The value is a reduced word (it came from reducedWords(w)): draw its wiring diagram. */
  reducedWord?: boolean;
  /** The ground set 1..n of a subset, when known. */
  groundSet?: number;
}

type Fields = Record<string, any>;

/** The kinds that have a scene, in the order the export tests list them. */
export const SCENE_KINDS = [
  'permutation',
  'partition',
  'composition',
  'tableau',
  'matching',
  'setPartition',
  'dyck',
  'word',
  'subset',
  'asm',
  'pipeDream',
  'matrix',
  'signedPermutation',
  'motzkin',
  'parkingFunction',
] as const;

export function sceneOf(v: Value, hint: SceneHint = {}): Scene | null {
  if (!isStructured(v)) return null;
  const o = v as unknown as Fields;
  const side = sideOf(v.kind, o);
  if (side === null || side > MAX_SIDE) return null;
  switch (v.kind) {
    case 'permutation':
      return permutationScene(o.a);
    case 'partition':
      return partitionScene(o.parts);
    case 'composition':
      return compositionScene(o.parts);
    case 'tableau':
      return tableauScene(o.rows);
    case 'matching':
      return matchingScene(o.p);
    case 'setPartition':
      return setPartitionScene(o.rgs);
    case 'dyck':
      return dyckPathScene(o.steps);
    case 'word':
      return hint.reducedWord && o.letters.length > 0 && o.letters.every((l: number) => l >= 1)
        ? wiringScene(o.letters)
        : wordScene(o.letters);
    case 'subset':
      return subsetScene(o.elems, Math.max(hint.groundSet ?? 0, ...o.elems, 1));
    case 'asm':
      return asmScene(o.rows);
    case 'pipeDream': {
      const n = Math.max(1, typeof o.n === 'number' ? o.n : 0, ...o.crosses.map(([i, j]: [number, number]) => i + j));
      return pipeDreamScene(o.crosses, n, pipeExits(o.crosses, n));
    }
    case 'signedPermutation':
      return signedPermutationScene(o.a);
    case 'motzkin':
      return motzkinPathScene(o.steps);
    case 'parkingFunction':
      return parkingFunctionScene(o.values);
    case 'matrix':
      return matrixScene(
        o.rows,
        o.cols,
        (o.entries as Value[]).map((e) => valueToText(e)),
      );
    default:
      return null;
  }
}

/** The longest side of the picture in cells, or null for kinds without a scene. */
function sideOf(kind: string, o: Fields): number | null {
  switch (kind) {
    case 'permutation':
      return o.a.length;
    case 'partition':
    case 'composition':
      return Math.max(o.parts.length, ...o.parts);
    case 'tableau':
    case 'asm':
      return Math.max(o.rows.length, ...o.rows.map((r: unknown[]) => r.length));
    case 'matching':
      return o.p.length;
    case 'setPartition':
      return o.rgs.length;
    case 'dyck':
      return o.steps.length / 2;
    case 'word':
      return o.letters.length;
    case 'subset':
      return Math.max(0, ...o.elems);
    case 'pipeDream':
      return Math.max(0, ...o.crosses.map(([i, j]: [number, number]) => i + j));
    case 'matrix':
      return Math.max(o.rows, o.cols);
    case 'signedPermutation':
      return o.a.length;
    case 'motzkin':
      return o.steps.length;
    case 'parkingFunction':
      return o.values.length;
    default:
      return null;
  }
}
