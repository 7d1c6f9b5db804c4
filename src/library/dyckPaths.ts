// Functions on Dyck paths: area, bounce, dinv, height, returns, peaks, valleys, the area
// sequence and the q,t-Catalan numbers. Conventions (U = north, D = east, the path above the
// diagonal): J. Haglund, The q,t-Catalan Numbers and the Space of Diagonal Harmonics (2008).

import { DyckPath } from '../families/dyckPaths/dyckPath.js';
import type { PolyLike } from '../algebra/polynomial.js';
import type { Value } from '../values/value.js';
import { defineFunction, type ParamDecl } from './registry.js';
import { smallIntArg } from './integerArgs.js';
import * as S from './dyckPaths/statistics.js';
import { qtCatalanTable } from './dyckPaths/qtCatalan.js';
import { evaluateTable } from './bivariate.js';

const topic = 'dyck paths';
const D: ParamDecl[] = [{ name: 'd', type: 'dyck' }];
const steps = (d: Value): number[] => (d as DyckPath).steps;
const QT_MAX = 40;

defineFunction({
  name: 'area',
  topic,
  params: D,
  returns: 'integer',
  description:
    'the number of full cells between the path and the diagonal (U north, D east): the sum of the heights at which the up steps start',
  example: 'area(dyck("UUDUDD"))',
  exampleValue: '2',
  source: 'OEIS A129182 (geometric area n + 2*area); Haglund, The q,t-Catalan Numbers (2008), ch. 1',
  impl: (d) => S.area(steps(d)),
});

defineFunction({
  name: 'areaSequence',
  topic,
  params: D,
  returns: 'list',
  description:
    'the area sequence [a_1, ..., a_n]: a_i is the height at which the i-th up step starts (the cells in row i between path and diagonal)',
  example: 'areaSequence(dyck("UUDUDD"))',
  exampleValue: '[0, 1, 1]',
  source: 'Haglund, The q,t-Catalan Numbers (2008), ch. 1 (area vector)',
  impl: (d) => S.areaSequence(steps(d)),
});

defineFunction({
  name: 'bounce',
  topic,
  params: D,
  returns: 'integer',
  description: 'the bounce statistic: the sum of n - j over the points (j, j) with 0 < j < n where the bounce path touches the diagonal',
  example: 'bounce(dyck("UDUUDD"))',
  exampleValue: '2',
  source: 'Haglund, Adv. Math. 175 (2003); Garsia and Haglund, Discrete Math. 256 (2002): q^area t^bounce sums to C_n(q, t), symmetric',
  impl: (d) => S.bounce(steps(d)),
});

defineFunction({
  name: 'dinv',
  topic,
  params: D,
  returns: 'integer',
  description: 'the dinv statistic on the area sequence a: pairs i < j with a_i = a_j or a_i = a_j + 1',
  example: 'dinv(dyck("UDUDUD"))',
  exampleValue: '3',
  source: 'Haglund, The q,t-Catalan Numbers (2008), ch. 3: (dinv, area) and (area, bounce) have the same joint distribution',
  impl: (d) => S.dinv(steps(d)),
});

defineFunction({
  name: 'height',
  topic,
  params: D,
  returns: 'integer',
  description: 'the largest height the path reaches',
  example: 'height(dyck("UUDUUDDD"))',
  exampleValue: '3',
  source: 'de Bruijn, Knuth and Rice, The average height of planted plane trees (1972); OEIS A080936 (paths by height)',
  impl: (d) => S.height(steps(d)),
});

defineFunction({
  name: 'returns',
  topic,
  params: D,
  returns: 'integer',
  description: 'the number of returns: down steps that end on the axis',
  example: 'returns(dyck("UDUUDD"))',
  exampleValue: '2',
  source: 'ballot numbers k/(2n-k) C(2n-k, n), OEIS A033184; Deutsch, Dyck path enumeration, Discrete Math. 204 (1999)',
  impl: (d) => S.returns(steps(d)),
});

defineFunction({
  name: 'peaks',
  topic,
  params: D,
  returns: 'integer',
  description: 'the number of peaks: factors UD',
  example: 'peaks(dyck("UDUUDD"))',
  exampleValue: '2',
  source: 'Narayana numbers, OEIS A001263',
  impl: (d) => S.peaks(steps(d)),
});

defineFunction({
  name: 'valleys',
  topic,
  params: D,
  returns: 'integer',
  description: 'the number of valleys: factors DU (one fewer than the peaks, for n >= 1)',
  example: 'valleys(dyck("UDUDUD"))',
  exampleValue: '2',
  source: 'Narayana numbers, OEIS A001263 (shifted by one); Deutsch, Discrete Math. 204 (1999)',
  impl: (d) => S.valleys(steps(d)),
});

defineFunction({
  name: 'qtCatalan',
  topic,
  params: [
    { name: 'n', type: 'integer' },
    { name: 'q', type: 'scalarOrPolynomial' },
    { name: 't', type: 'scalarOrPolynomial' },
  ],
  returns: 'scalarOrPolynomial',
  description:
    'the q,t-Catalan number C_n(q, t), the sum of q^area(d) t^bounce(d) over the Dyck paths of semilength n (Garsia–Haglund recursion)',
  example: 'qtCatalan(3, q, t)',
  exampleValue: 'q^3 + q^2*t + q*t^2 + t^3 + q*t',
  source: 'Garsia and Haglund, "A proof of the q,t-Catalan positivity conjecture", Discrete Math. 256 (2002); q = t = 1: OEIS A000108',
  impl: (n, q, t) => evaluateTable(qtCatalanTable(smallIntArg('qtCatalan(n, q, t)', 'n', n, 0, QT_MAX)), q as PolyLike, t as PolyLike),
});
