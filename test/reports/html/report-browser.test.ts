// The report page opened in a real headless browser (Debian's Chromium, driven by playwright-core,
// which uses the installed browser and downloads none): one row per conjecture, the outcome cells,
// the counterexample pictures present as SVG, no request leaving the file, and a screenshot whose
// pixels are not blank. .ci/run installs chromium; where it is missing this prints SKIPPED.
// HUNCH_UPDATE_SCREENSHOT=1 also writes the screenshot shown in README (test/reports/html/report.png).

import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { parse } from 'yaml';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli } from '../../cli/run-cli.js';
import { checkedNotebook, type CheckedNotebook } from '../checked-notebook.js';
import { readPng } from './png.js';

const CHROMIUM = process.env.HUNCH_CHROMIUM ?? '/usr/bin/chromium';
const haveBrowser = existsSync(CHROMIUM);
if (!haveBrowser) console.log(`SKIPPED: report page browser test: no Chromium at ${CHROMIUM} (Debian package: chromium)`);

/** Flags for a headless browser on a machine without network: nothing in the background. */
const BROWSER_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];

/** Whether a counterexample file's case holds an object with a picture (a one-key map). */
function hasObjectBinding(file: string): boolean {
  const doc = parse(readFileSync(file, 'utf8')) as { bindings: Record<string, unknown> };
  return Object.values(doc.bindings).some((v) => v !== null && typeof v === 'object' && !Array.isArray(v));
}

describe.skipIf(!haveBrowser)('the report page in a real browser', () => {
  let nb: CheckedNotebook;
  let page: string;
  beforeAll(() => {
    nb = checkedNotebook();
    page = join(nb.dir, 'report.html');
    const r = runCli(['report', '--allow-plugins', '-o', page, '--title', "The working group's notebook"], { cwd: nb.dir });
    if (r.code !== 0) throw new Error(r.stderr);
  }, 240_000);
  afterAll(() => nb?.dispose());

  it('shows every conjecture, its outcome and the counterexample pictures, and fetches nothing', async () => {
    const { chromium } = await import('playwright-core');
    const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: BROWSER_ARGS });
    try {
      const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
      const tab = await context.newPage();
      const url = pathToFileURL(page).href;
      const requests: string[] = [];
      tab.on('request', (r) => requests.push(r.url()));
      await context.route('**/*', (route) => (route.request().url() === url ? route.continue() : route.abort()));
      await tab.goto(url, { waitUntil: 'load' });

      const status = JSON.parse(runCli(['status', '--json', '--allow-plugins'], { cwd: nb.dir }).stdout);
      const ids: string[] = status.conjectures.map((c: { id: string }) => c.id);
      const rows: string[] = await tab.$$eval('tr.conjecture', (trs) => trs.map((tr) => tr.getAttribute('data-id') ?? ''));
      expect(rows).toEqual(ids);
      const outcomes: string[] = await tab.$$eval('tr.conjecture td.outcome', (tds) => tds.map((td) => td.textContent ?? ''));
      expect(outcomes.length).toBe(ids.length);
      for (const o of outcomes) expect(o).toMatch(/^(holds|fails|incomplete|never checked)/);
      expect(await tab.$$eval('tr.conjecture td.outcome.disagrees', (tds) => tds.length)).toBe(0);

      const sections: string[] = await tab.$$eval('section.counterexample', (ss) => ss.map((s) => s.getAttribute('data-id') ?? ''));
      expect(sections.sort()).toEqual(nb.counterexamples.map((f) => f.replace(/\.yaml$/, '')).sort());
      for (const id of sections) {
        const svgs = await tab.$$eval(`section.counterexample[data-id="${id}"] figure svg`, (s) => s.length);
        if (hasObjectBinding(join(nb.dir, 'counterexamples', `${id}.yaml`))) expect(svgs, id).toBeGreaterThan(0);
        // the table links to the section and back
        expect(await tab.$$eval(`a[href="#cx-${id}"]`, (a) => a.length), id).toBe(1);
      }
      expect(await tab.textContent('body')).toContain('evidence, not proof');
      expect(requests.filter((r) => r !== url)).toEqual([]);

      const shot = await tab.screenshot({ fullPage: true });
      const img = readPng(shot);
      const colours = new Set<number>();
      let inked = 0;
      for (let i = 0; i < img.width * img.height; i++) {
        const [r, g, b] = img.rgba.subarray(i * 4, i * 4 + 3);
        colours.add((r << 16) | (g << 8) | b);
        if (r + g + b < 600) inked++;
      }
      expect(colours.size).toBeGreaterThan(20);
      expect(inked / (img.width * img.height)).toBeGreaterThan(0.01);
      if (process.env.HUNCH_UPDATE_SCREENSHOT === '1') {
        const top = await tab.screenshot({ clip: { x: 0, y: 0, width: 1440, height: 900 } });
        writeFileSync(join(ROOT, 'test', 'reports', 'html', 'report.png'), top);
        const section = await tab.$('section.counterexample[data-id="maj-bounded-by-inv"]');
        if (section) writeFileSync(join(ROOT, 'test', 'reports', 'html', 'report-counterexample.png'), await section.screenshot());
      }
    } finally {
      await browser.close();
    }
  }, 240_000);
});
