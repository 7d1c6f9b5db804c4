// This repository's own conjectures (conjectures/) as a regression suite: one test per conjecture,
// each passing when hunch's result agrees with the conjecture's `expect`.
import { describe, expect, test } from 'vitest';
import { defineConjectureTests } from '../../src/api/index.js';

defineConjectureTests('conjectures', { describe, test, expect });
