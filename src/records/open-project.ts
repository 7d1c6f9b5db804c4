// Opening a project for a command: find its root, read hunch.yaml, load its plugins and make
// compiled conjectures carry the canonical hash. Every command that compiles conjectures, and
// every worker thread, calls this first.

import { readProjectConfig, type ProjectConfig } from './config.js';
import { installConjectureHash, loadPlugins, type LoadedPlugin } from './plugins.js';
import { findProjectRoot } from './project.js';

export interface Project {
  root: string;
  config: ProjectConfig;
  plugins: LoadedPlugin[];
}

/** `start`: a path inside the project (a conjecture file or folder); default the current folder. */
export async function openProject(start: string = process.cwd()): Promise<Project> {
  const root = findProjectRoot(start);
  return openProjectAt(root);
}

/** Open the project whose root is known (e.g. passed to a worker thread). */
export async function openProjectAt(root: string): Promise<Project> {
  installConjectureHash();
  const config = readProjectConfig(root);
  const plugins = await loadPlugins(config.plugins, root);
  return { root, config, plugins };
}
