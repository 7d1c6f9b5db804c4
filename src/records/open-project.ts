// Opening a project for a command: find its root, read hunch.yaml, load its plugins when the user
// consented (records/trust.ts) and make compiled conjectures carry the canonical hash. Every
// command that compiles conjectures, and every worker thread, calls this first.

import { InputError } from '../base/errors.js';
import { readProjectConfig, type ProjectConfig } from './config.js';
import { loadPlugins, type LoadedPlugin } from './plugins.js';
import { findProjectRoot } from './project-root.js';
import { fingerprints, pluginConsent } from './trust.js';

/** A plugin file the main thread decided to load, passed to worker threads (plain data). */
export interface ApprovedPlugin {
  path: string;
  sha256: string;
}

export interface Project {
  root: string;
  config: ProjectConfig;
  plugins: LoadedPlugin[];
  /** Plugins listed in hunch.yaml that were not loaded, and why (null: none was skipped). */
  skipped: { files: string[]; why: string } | null;
}

export interface OpenOptions {
  /** --allow-plugins: load the project's plugins without it being on the allow list. */
  allowPlugins?: boolean;
  /** false: never load plugins, whatever the allow list says (replay without --allow-plugins). */
  plugins?: boolean;
}

/** `start`: a path inside the project (a conjecture file or folder); default the current folder. */
export async function openProject(start: string = process.cwd(), opts: OpenOptions = {}): Promise<Project> {
  const root = findProjectRoot(start);
  const config = readProjectConfig(root);
  if (config.plugins.length === 0) return { root, config, plugins: [], skipped: null };
  const files = fingerprints(config).map((f) => f.file);
  if (opts.plugins === false && !opts.allowPlugins)
    return { root, config, plugins: [], skipped: { files, why: 'this command loads plugins only when given --allow-plugins' } };
  const consent = pluginConsent(config, opts.allowPlugins === true);
  if (!consent.trusted) return { root, config, plugins: [], skipped: { files, why: consent.why } };
  return { root, config, plugins: await loadPlugins(config.plugins, root), skipped: null };
}

/** The loaded plugins as a worker thread must load them (the same files, byte for byte). */
export function approvedPlugins(project: Project): ApprovedPlugin[] {
  return project.plugins.map((p) => ({ path: p.path, sha256: p.sha256 }));
}

/**
 * Open the project whose root is known, in a worker thread: load exactly the plugins the main
 * thread approved, refusing one whose file changed in between.
 */
export async function openProjectAt(root: string, approved: readonly ApprovedPlugin[] = []): Promise<Project> {
  const config = readProjectConfig(root);
  const plugins = await loadPlugins(
    approved.map((a) => a.path),
    root,
  );
  for (const p of plugins) {
    const want = approved.find((a) => a.path === p.path);
    if (want && want.sha256 !== p.sha256)
      throw new InputError(`the plugin ${p.file} changed while hunch was starting; run the command again`);
  }
  return { root, config, plugins, skipped: null };
}

/** In words: which plugins were not loaded, why, and how to allow them. */
export function skippedPluginsNote(project: Project): string | null {
  if (!project.skipped) return null;
  const { files, why } = project.skipped;
  return (
    `not loading the plugin${files.length === 1 ? '' : 's'} ${files.join(', ')} listed in ${project.config.file ?? 'hunch.yaml'}: ${why}. ` +
    `Plugins are code; if you trust this project, run "hunch trust ${trustDirHint(project)}" once (or pass --allow-plugins to allow them this time)`
  );
}

function trustDirHint(project: Project): string {
  const rel = project.root === process.cwd() ? '.' : project.root;
  return /^[A-Za-z0-9_./-]+$/.test(rel) ? rel : JSON.stringify(rel);
}

/**
 * An unknown-function error in a project whose plugins were skipped: say that the function may
 * come from them, and name the trust step. Other errors pass through unchanged.
 */
export function explainSkippedPlugins(e: unknown, project: Project | null): unknown {
  if (!project?.skipped || !(e instanceof InputError) || !/^unknown function /.test(e.message)) return e;
  const note =
    `; the project's plugins (${project.skipped.files.join(', ')}) were not loaded: ${project.skipped.why}. ` +
    `If you trust them, run "hunch trust ${trustDirHint(project)}" once, or pass --allow-plugins`;
  return new InputError(e.message + note, e.pos, e.snippet, e.suggestion);
}
