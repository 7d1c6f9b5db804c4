// Opening the project for a command: plugins load only with the user's consent, and when they are
// skipped the user is told which ones and how to allow them (on standard error, once).

import { openProject, skippedPluginsNote, type OpenOptions, type Project } from '../records/open-project.js';
import type { Terminal } from './terminal.js';

export const ALLOW_PLUGINS_HELP =
  "run the project's plugins (code listed in hunch.yaml) this time, even if it is not trusted (see hunch trust)";

export async function openCommandProject(
  t: Terminal,
  start: string | undefined,
  opts: OpenOptions & { quiet?: boolean } = {},
): Promise<Project> {
  const project = await openProject(start ?? process.cwd(), opts);
  const note = skippedPluginsNote(project);
  if (note && !opts.quiet) t.err(`${t.color.yellow('note:')} ${note}.\n`);
  return project;
}
