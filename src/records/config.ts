// The project config, hunch.yaml at the project root:
//
//   plugins:                  # modules that add functions to the language (code: listed here only)
//     - plugins/my-statistics.mjs
//   ledger: hunch-ledger.jsonl   # where coverage is recorded (default)
//   conjectures: conjectures     # the default paths of `hunch check` and `hunch status`
//
// Paths are relative to hunch.yaml. Unknown keys are errors, as in conjecture files.

import { existsSync, readFileSync } from 'node:fs';
import { isAbsolute, join, relative, resolve } from 'node:path';
import { isScalar, type Node } from 'yaml';
import { InputError } from '../base/errors.js';
import { nearest } from '../base/suggest.js';
import { mapEntries, scalarString, seqItems, YamlFile } from '../language/conjecture/yaml-reader.js';
import { CONFIG_FILE, DEFAULT_LEDGER } from './project-root.js';
import { isInside } from './atomic-write.js';

export const CONFIG_KEYS = ['plugins', 'ledger', 'conjectures'] as const;

export interface ProjectConfig {
  root: string;
  /** The config file, or null when the project has none. */
  file: string | null;
  /** Plugin modules, absolute paths, in the order listed. */
  plugins: string[];
  /** The ledger, absolute. */
  ledger: string;
  /** Default conjecture paths, absolute. */
  conjectures: string[];
}

export function defaultConfig(root: string): ProjectConfig {
  return { root, file: null, plugins: [], ledger: join(root, DEFAULT_LEDGER), conjectures: [join(root, 'conjectures')] };
}

function under(root: string, p: string): string {
  return isAbsolute(p) ? p : resolve(root, p);
}

/** Parse the text of a hunch.yaml. */
export function parseConfig(root: string, file: string, text: string): ProjectConfig {
  const cfg = defaultConfig(root);
  cfg.file = file;
  const y = new YamlFile(file, text);
  const docs = y.docs.filter((d) => d.contents !== null);
  if (docs.length === 0) return cfg;
  if (docs.length > 1) throw new InputError(`${CONFIG_FILE} must hold a single YAML document`, y.nodePos(docs[1].contents as Node));
  const strings = (node: Node | null, what: string): string[] =>
    isScalar(node) ? [scalarString(y, node, what)] : seqItems(y, node, what).map((n) => scalarString(y, n, what));
  for (const { key, keyNode, value } of mapEntries(y, docs[0].contents as Node, CONFIG_FILE)) {
    switch (key) {
      case 'plugins':
        cfg.plugins = value === null ? [] : strings(value, 'a plugin path').map((p) => under(root, p));
        break;
      case 'ledger': {
        const text = scalarString(y, value, 'ledger');
        cfg.ledger = under(root, text);
        // A received hunch.yaml must not make hunch write elsewhere (--ledger PATH is the user's own choice).
        if (!isInside(root, cfg.ledger) || cfg.ledger === root)
          throw new InputError(
            `the ledger "${text}" lies outside the project ${root}; hunch writes only inside the project. ` +
              'Give a path inside it, or pass --ledger PATH on the command line to write elsewhere',
            value ? y.nodePos(value) : y.nodePos(keyNode),
            text,
          );
        break;
      }
      case 'conjectures':
        cfg.conjectures = strings(value, 'a conjecture path').map((p) => under(root, p));
        break;
      default: {
        const s = nearest(key, CONFIG_KEYS);
        throw new InputError(
          `unknown key "${key}" in ${CONFIG_FILE}${s ? `; did you mean "${s}"?` : ''} (known keys: ${CONFIG_KEYS.join(', ')})`,
          y.nodePos(keyNode),
          key,
          s,
        );
      }
    }
  }
  return cfg;
}

/** The config of the project at `root` (defaults when it has no hunch.yaml). */
export function readProjectConfig(root: string): ProjectConfig {
  const file = join(root, CONFIG_FILE);
  if (!existsSync(file)) return defaultConfig(root);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    throw new InputError(`cannot read ${file}: ${(e as Error).message}`);
  }
  return parseConfig(root, relative(process.cwd(), file) || file, text);
}
