// A value of the expression language. Primitives are kept as plain JS values for speed:
// integers as number (safe) or bigint, booleans, strings; lists as arrays; everything else is
// Structured. There is no floating-point value anywhere.

import type { Scalar } from '../numbers/rational.js';
import type { Structured } from './structured.js';

export type Value = Scalar | boolean | string | readonly Value[] | Structured;

export type { Structured };
