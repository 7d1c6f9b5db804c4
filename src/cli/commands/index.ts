// Every command of CLI.md; each module adds itself to the program. One command per line, so that
// adding one is adding a line.

import type { Command } from 'commander';
import type { Terminal } from '../terminal.js';
import { addCheckCommand } from './check.js';
import { addEvalCommand } from './eval.js';
import { addTableCommand } from './table.js';
import { addListCommand } from './list.js';
import { addStatusCommand } from './status.js';
import { addReplayCommand } from './replay.js';
import { addMergeCommand } from './merge.js';
import { addInitCommand } from './init.js';
import { addSlurmCommand } from './slurm.js';
import { addTrustCommand } from './trust.js';
import { addSampleCommand } from './sample.js';
import { addGuessCommand } from './guess.js';
import { addExportCommand } from './export.js';
import { addReportCommand } from './report.js';

/** Adds a command; the action reports its exit code through setExit. */
export type AddCommand = (program: Command, t: Terminal, setExit: (code: number) => void) => void;

export const commands: AddCommand[] = [
  addCheckCommand,
  addEvalCommand,
  addTableCommand,
  addListCommand,
  addStatusCommand,
  addReplayCommand,
  addMergeCommand,
  addInitCommand,
  addSlurmCommand,
  addTrustCommand,
  addSampleCommand,
  addGuessCommand,
  addExportCommand,
  addReportCommand,
];
