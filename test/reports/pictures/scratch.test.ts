import { test } from 'vitest';
import { drawValue } from '../../../src/reports/pictures/index.js';
import { PipeDream } from '../../../src/families/pipeDreams/pipeDream.js';
test('show', () => {
  for (const c of [[[2,1]], [[1,2]], [[1,2],[1,3],[2,2]], [[1,1],[2,2],[1,4]]])
  for (const u of [true, false]) console.log(drawValue(PipeDream.from(c) as any, { unicode: u }) + '\n');
});
