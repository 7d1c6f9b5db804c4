// Functions on permutations (LIBRARY.md §2), one file per group under ./permutations/.
// (rsk and rskShape live with the tableaux.)

import './permutations/statistics.js';
import './permutations/constructions.js';
import './permutations/patterns.js';
import './permutations/orders.js';
import './permutations/cycles.js';
import './permutations/symmetries.js';
import './permutations/foata.js';
