// This repository's own conjectures (conjectures/) as a regression suite: one test per conjecture,
// each passing when hunch's result agrees with the conjecture's `expect`.
import { describe, expect, test } from 'vitest';
import { defineConjectureTests } from '../../src/api/index.js';

// The notebook's own plugin (conjectures/plugins/runs.mjs) is this repository's code: allowed explicitly.
defineConjectureTests('conjectures', { describe, test, expect }, { allowPlugins: true });
