// Consent before running a project's plugins. Plugins are code; a folder received from someone
// else (or a hunch.yaml in a shared parent folder such as /tmp) must not run code just because a
// command was pointed at it. A project's plugins are loaded only when
//   - its user trusted it once (`hunch trust DIR`), recorded in a per-user allow list keyed by the
//     real path of its hunch.yaml and the sha256 of every plugin file it lists (editing a plugin or
//     listing a new one withdraws the trust until it is given again), or
//   - the command was given --allow-plugins.
//
// The allow list is a JSON file in the user's configuration folder: $HUNCH_CONFIG_DIR if set (the
// tests point it at a temporary folder), else $XDG_CONFIG_HOME/hunch, else ~/.config/hunch.
// Deciding reads the plugin files' bytes to hash them; it never imports them.

import { readFileSync, realpathSync } from 'node:fs';
import { homedir } from 'node:os';
import { join, relative } from 'node:path';
import { InputError } from '../base/errors.js';
import { writeFileAtomic } from './atomic-write.js';
import type { ProjectConfig } from './config.js';
import { fileHash } from '../language/conjecture/conjecture-hash.js';

export const TRUST_FILE = 'trusted-projects.json';
const TRUST_FORMAT = 1;

/** A plugin file as listed in hunch.yaml, with the hash of its current bytes (null: unreadable). */
export interface PluginFingerprint {
  /** Absolute path as listed. */
  path: string;
  /** The real path (links resolved), or the listed path when it cannot be resolved. */
  real: string;
  /** As listed, relative to the project root. */
  file: string;
  sha256: string | null;
}

export interface TrustEntry {
  /** The real path of the project's hunch.yaml. */
  config: string;
  /** Real plugin path → sha256 when trusted. */
  plugins: Record<string, string>;
  at: string;
}

interface TrustList {
  format: number;
  projects: TrustEntry[];
}

/** The per-user folder holding the allow list. */
export function userConfigDir(): string {
  const own = process.env.HUNCH_CONFIG_DIR;
  if (own) return own;
  const xdg = process.env.XDG_CONFIG_HOME;
  if (xdg) return join(xdg, 'hunch');
  return join(homedir(), '.config', 'hunch');
}

export function trustListPath(): string {
  return join(userConfigDir(), TRUST_FILE);
}

function realOr(p: string): string {
  try {
    return realpathSync(p);
  } catch {
    return p;
  }
}

export function fingerprints(config: ProjectConfig): PluginFingerprint[] {
  return config.plugins.map((path) => {
    let sha256: string | null = null;
    try {
      sha256 = fileHash(readFileSync(path));
    } catch {
      sha256 = null;
    }
    return { path, real: realOr(path), file: relative(config.root, path) || path, sha256 };
  });
}

function readTrustList(): TrustList {
  const path = trustListPath();
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    return { format: TRUST_FORMAT, projects: [] };
  }
  try {
    const d = JSON.parse(text) as TrustList;
    if (d && Array.isArray(d.projects))
      return {
        format: TRUST_FORMAT,
        projects: d.projects.filter((p) => p && typeof p.config === 'string' && p.plugins && typeof p.plugins === 'object'),
      };
  } catch {
    // a damaged list trusts nothing; `hunch trust` writes a fresh one
  }
  return { format: TRUST_FORMAT, projects: [] };
}

export type TrustVerdict = { trusted: true; why: 'flag' | 'trusted' | 'no-plugins' } | { trusted: false; why: string };

/** Whether the project's plugins may run: --allow-plugins, or the allow list matches every plugin file. */
export function pluginConsent(config: ProjectConfig, allowFlag: boolean): TrustVerdict {
  if (config.plugins.length === 0) return { trusted: true, why: 'no-plugins' };
  if (allowFlag) return { trusted: true, why: 'flag' };
  if (!config.file) return { trusted: false, why: 'the project has no hunch.yaml' };
  const key = realOr(join(config.root, 'hunch.yaml'));
  const entry = readTrustList().projects.find((p) => p.config === key);
  if (!entry) return { trusted: false, why: 'this project has not been trusted on this account' };
  for (const f of fingerprints(config)) {
    const was = entry.plugins[f.real];
    if (was === undefined) return { trusted: false, why: `${f.file} was added to hunch.yaml after the project was trusted` };
    if (f.sha256 !== was) return { trusted: false, why: `${f.file} changed after the project was trusted (${entry.at.slice(0, 10)})` };
  }
  return { trusted: true, why: 'trusted' };
}

/** Record the project, with its plugin files as they are now, in the allow list. */
export function trustProject(config: ProjectConfig): TrustEntry {
  if (!config.file) throw new InputError(`there is no hunch.yaml in ${config.root}; there is nothing to trust`);
  const prints = fingerprints(config);
  const missing = prints.find((p) => p.sha256 === null);
  if (missing) throw new InputError(`the plugin ${missing.file} listed in hunch.yaml cannot be read (looked for ${missing.path})`);
  const entry: TrustEntry = {
    config: realOr(join(config.root, 'hunch.yaml')),
    plugins: Object.fromEntries(prints.map((p) => [p.real, p.sha256!])),
    at: new Date().toISOString(),
  };
  const list = readTrustList();
  list.projects = [...list.projects.filter((p) => p.config !== entry.config), entry];
  writeFileAtomic(trustListPath(), JSON.stringify(list, null, 2) + '\n', { what: 'the list of trusted projects' });
  return entry;
}

/** Remove the project from the allow list; returns whether it was there. */
export function distrustProject(config: ProjectConfig): boolean {
  const key = realOr(join(config.root, 'hunch.yaml'));
  const list = readTrustList();
  const kept = list.projects.filter((p) => p.config !== key);
  if (kept.length === list.projects.length) return false;
  writeFileAtomic(trustListPath(), JSON.stringify({ ...list, projects: kept }, null, 2) + '\n', { what: 'the list of trusted projects' });
  return true;
}
