// hunch trust [DIR]: allow the plugins of a project to run, remembered for this user. It shows what
// is trusted (the hunch.yaml and each plugin file with its sha256); editing a plugin or listing a
// new one withdraws the trust until the command is run again. --forget removes the project.

import { statSync } from 'node:fs';
import { readProjectConfig } from '../../records/config.js';
import { findProjectRoot } from '../../records/project-root.js';
import { distrustProject, fingerprints, trustListPath, trustProject } from '../../records/trust.js';
import { InputError } from '../../base/errors.js';
import { EXIT } from '../errors.js';
import { escapeControl } from '../../base/escape.js';
import type { AddCommand } from './index.js';

export const addTrustCommand: AddCommand = (program, t, setExit) => {
  program
    .command('trust')
    .description("allow a project's plugins (code listed in its hunch.yaml) to run, remembered for this user")
    .argument('[dir]', 'the project folder (default: the project of the current folder)')
    .option('--forget', 'remove the project from the allow list')
    .action((dir: string | undefined, flags: { forget?: boolean }) => {
      if (dir !== undefined) {
        let isDir = false;
        try {
          isDir = statSync(dir).isDirectory();
        } catch {
          isDir = false;
        }
        if (!isDir) throw new InputError(`hunch trust takes a project folder; ${dir} is not a folder`);
      }
      const root = findProjectRoot(dir ?? process.cwd());
      const config = readProjectConfig(root);
      if (!config.file) throw new InputError(`there is no hunch.yaml in ${root} or any folder above it; there is nothing to trust`);
      if (flags.forget) {
        const was = distrustProject(config);
        t.out(was ? `No longer trusted: ${escapeControl(root)}\n` : `${escapeControl(root)} was not trusted.\n`);
        setExit(EXIT.ok);
        return;
      }
      const prints = fingerprints(config);
      if (prints.length === 0) {
        t.out(`${escapeControl(config.file)} lists no plugins: nothing needs trusting.\n`);
        setExit(EXIT.ok);
        return;
      }
      const entry = trustProject(config);
      t.out(
        `Trusting the project ${escapeControl(root)} (its ${escapeControl(config.file)}): these plugins will run when hunch uses it:\n`,
      );
      for (const p of prints)
        t.out(`    ${escapeControl(p.file)}  sha256 ${p.sha256}${p.real !== p.path ? `  (${escapeControl(p.real)})` : ''}\n`);
      t.out(`Recorded in ${escapeControl(trustListPath())} on ${entry.at.slice(0, 10)}. If a plugin file changes, hunch asks again.\n`);
      setExit(EXIT.ok);
    });
};
