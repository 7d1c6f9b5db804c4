import { writeFileSync, mkdirSync } from 'node:fs';
import { tempDir } from '../helpers/temp-dirs.js';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import '../../src/library/index.js';
import { check, load } from '../../src/api/index.js';
import { getFunction } from '../../src/library/registry.js';
import { parseConfig } from '../../src/records/config.js';
import { loadPlugin, pluginHashes } from '../../src/records/plugins.js';
import { runCli } from '../cli/run-cli.js';

const PLUGIN = (extra = '') => `${extra}
export const functions = [
  {
    name: 'twiceOf',
    params: [{ name: 'n', type: 'integer' }],
    returns: 'integer',
    description: 'Twice n.',
    impl: (n) => (typeof n === 'bigint' ? 2n * n : 2 * n),
  },
];
`;

// Doubling is n + n (definition); the second conjecture does not use the plugin.
const CONJ = `
conjecture: twice-is-sum
expect: holds
for:
  n: 1..5
claim: twiceOf(n) == n + n
---
conjecture: no-plugin
expect: holds
for:
  n: 1..5
claim: n + n == 2 * n
`;

function project(): string {
  const d = tempDir('hunch-plugin-');
  mkdirSync(join(d, 'plugins'));
  mkdirSync(join(d, 'conjectures'));
  writeFileSync(join(d, 'hunch.yaml'), 'plugins:\n  - plugins/twice.mjs\n');
  writeFileSync(join(d, 'plugins', 'twice.mjs'), PLUGIN());
  writeFileSync(join(d, 'conjectures', 'a.yaml'), CONJ);
  return d;
}

describe('project config', () => {
  test('paths are relative to hunch.yaml; unknown keys are errors with a suggestion', () => {
    const c = parseConfig('/p', 'hunch.yaml', 'plugins: [a.mjs]\nledger: l.jsonl\n');
    expect(c.plugins).toEqual(['/p/a.mjs']);
    expect(c.ledger).toBe('/p/l.jsonl');
    expect(() => parseConfig('/p', 'hunch.yaml', 'plugin: [a.mjs]\n')).toThrow(
      /unknown key "plugin" in hunch.yaml; did you mean "plugins"\?/,
    );
  });
});

describe('plugins', () => {
  test('a plugin registers its functions; its file hash enters only the conjectures that use it, and editing it makes them stale', async () => {
    const d = project();
    const cs = await load(join(d, 'conjectures'), { allowPlugins: true });
    expect(getFunction('twiceOf')?.topic).toBe('plugins');
    expect(pluginHashes().twiceOf).toMatch(/^[0-9a-f]{64}$/);
    for (const c of cs) expect(check(c, { ledger: true }).outcome).toBe('holds');

    const before = JSON.parse(runCli(['status', '--json', '--allow-plugins'], { cwd: d }).stdout);
    expect(before.conjectures.map((c: any) => c.exhaustive.length)).toEqual([5, 5]);

    writeFileSync(join(d, 'plugins', 'twice.mjs'), PLUGIN('// a comment changes the file'));
    const after = JSON.parse(runCli(['status', '--json', '--allow-plugins'], { cwd: d }).stdout);
    const [uses, not] = after.conjectures;
    expect(uses.exhaustive).toEqual([]);
    expect(uses.stale.records).toBe(5);
    expect(not.exhaustive).toHaveLength(5);
    expect(not.stale).toBeNull();
  }, 60_000);

  test('bad plugins are clear errors', async () => {
    const d = tempDir('hunch-plugin-');
    const put = (name: string, text: string) => (writeFileSync(join(d, name), text), join(d, name));
    await expect(loadPlugin(join(d, 'nope.mjs'), d)).rejects.toThrow(/nope\.mjs listed in hunch\.yaml does not exist/);
    await expect(loadPlugin(put('none.mjs', 'export const x = 1;'), d)).rejects.toThrow(/exports no "functions"/);
    await expect(
      loadPlugin(put('clash.mjs', 'export const functions = [{ name: "inv", params: ["permutation"], impl: () => 0 }];'), d),
    ).rejects.toThrow(/defines inv, which already exists/);
    await expect(
      loadPlugin(put('untyped.mjs', 'export const functions = [{ name: "f1", params: [{ name: "x" }], impl: () => 0 }];'), d),
    ).rejects.toThrow(/without a type/);
    await expect(loadPlugin(put('p.cjs', ''), d)).rejects.toThrow(/must be a JavaScript module/);
    if (!(process as any).features?.typescript)
      await expect(loadPlugin(put('p.ts', ''), d)).rejects.toThrow(/TypeScript, which this Node .* cannot load directly; compile it/);
  });
});
