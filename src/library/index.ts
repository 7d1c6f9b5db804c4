// Registers every built-in function: importing a topic module defines its functions.
// A new topic file is added here (and its functions then appear in `hunch list`).
import './constructors.js';
import './permutations.js';
import './numbers.js';
import './lists.js';
import './matchings.js';
import './partitions.js';
import './tableaux.js';
import './kostka.js';
import './littlewoodRichardson.js';
import './characters.js';
import './rsk.js';
import './polynomials.js';
import './qanalogs.js';
import './matrices.js';
import './schubert.js';
import './markov.js';
import './moves.js';
import './dyckPaths.js';
import './charge.js';
import './setPartitions.js';
import './sequences.js';
import './kronecker.js';
import './signedPermutations.js';
import './paths.js';
import './schubertCombinatorics.js';
