/**
 * The Export menu in Chromium: the demo designer opens the demo chest and downloads its plan set
 * (jsPDF in the browser, with JetBrains Mono as TrueType made from the shipped woff2 at build time), a view as SVG and the cut
 * list as CSV. The PDF is read back with poppler's pdftotext; the expected sizes come from the
 * engine run on the revision the server stores, never typed in by hand.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Download, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { lengthText, partSizeText } from '../../shared/drawing/lengthText.ts';
import { partLetters } from '../../shared/drawing/partLetters.ts';
import { buildPiece } from '../../shared/engine/index.ts';
import { validateSpec } from '../../shared/engine/params.ts';
import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import { DEMO_WORKSHOP } from '../../server/db/seed.ts';
import { SCREENSHOT_DIR } from '../support/browser.ts';
import { openDemoBrowser, type DemoBrowser } from '../support/demoBrowser.ts';

interface DemoAccounts {
  password: string;
  accounts: { role: string; email: string }[];
}
const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as DemoAccounts;
const designer = demo.accounts.find((a) => a.role === 'designer')!;
const CHEST_TITLE = 'Blanket chest, white oak';

let server: DemoBrowser['server'];
let browser: DemoBrowser['browser'];
let page: Page;
let dir: string;
let result: PieceResult;
let head = 0;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'casewright-export-'));
  ({ server, browser, page } = await openDemoBrowser());
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

async function openExportMenu() {
  const toggle = page.getByRole('button', { name: /^Export/ });
  if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
  await page.getByRole('dialog', { name: 'Export' }).waitFor();
}

async function download(click: () => Promise<void>): Promise<{ path: string; name: string }> {
  const [file] = await Promise.all([page.waitForEvent('download') as Promise<Download>, click()]);
  const path = join(dir, file.suggestedFilename());
  await file.saveAs(path);
  return { path, name: file.suggestedFilename() };
}

describe('the Export menu', () => {
  let pdfText = '';
  let pdfPath = '';

  it('opens the demo chest as the demo designer', async () => {
    await page.goto(`${server.url}/signin`);
    await page.getByLabel('E-mail').fill(designer.email);
    await page.getByLabel('Password').fill(demo.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    await page.getByRole('link', { name: CHEST_TITLE }).first().click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    await page.locator('table[aria-label="Cut list"]').waitFor();
    const designId = page.url().split('/').pop()!;
    const stored = await page.evaluate(async (id) => {
      const body = await (await fetch(`/api/designs/${id}`)).json();
      return { spec: body.headRevision.spec, head: body.head.number };
    }, designId) as { spec: PieceSpec; head: number };
    result = buildPiece(validateSpec(stored.spec));
    head = stored.head;
    expect(head).toBeGreaterThan(0);
  });

  it('says clearly when the plan set cannot be made, and the page keeps working', async () => {
    // The dimension font (TrueType, made from the shipped woff2 at build time) cannot be fetched: the export must fail with words, not silently.
    await page.route('**/JetBrainsMono-*.ttf', (route) => route.fulfill({ status: 503, body: '' }));
    await openExportMenu();
    await page.getByRole('button', { name: 'Download the plan set' }).click();
    const alert = page.getByRole('dialog', { name: 'Export' }).getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/Export failed.*could not export the plan set.*dimension font \(503\)/is);
    await page.unroute('**/JetBrainsMono-*.ttf');
    expect(await page.getByRole('button', { name: 'Download the plan set' }).isEnabled()).toBe(true);
  });

  it('downloads the plan set PDF with a progress bar that counts the sheets', async () => {
    await openExportMenu();
    await page.getByRole('radio', { name: 'Landscape' }).click();
    await page.getByRole('dialog', { name: 'Export' }).getByRole('radio', { name: 'inch' }).click();
    await page.getByRole('dialog', { name: 'Export' }).getByRole('combobox', { name: 'Sheet' }).selectOption('letter');
    // The menu names the stock the cutting diagrams use once it has read the workshop's.
    await page.getByRole('dialog', { name: 'Export' }).getByText(/Cutting diagrams use the workshop's stock, as on the Materials page \(\d+ boards on hand first\)/).waitFor();
    // Record every state of the progress bar while the export runs.
    await page.evaluate(() => {
      const seen: string[] = [];
      (window as unknown as { progressSeen: string[] }).progressSeen = seen;
      new MutationObserver(() => {
        const bar = document.querySelector('progress[aria-label="Plan set progress"]');
        if (bar) seen.push(`${bar.getAttribute('value')}/${bar.getAttribute('max')}`);
      }).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    const file = await download(() => page.getByRole('button', { name: 'Download the plan set' }).click());
    expect(file.name).toBe(`blanket-chest-white-oak-r${head}-plan-set.pdf`);
    pdfPath = file.path;
    expect(readFileSync(pdfPath).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    pdfText = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });

    const seen = await page.evaluate(() => (window as unknown as { progressSeen: string[] }).progressSeen);
    const counted = seen.map((s) => s.split('/').map(Number)).filter(([, max]) => max! > 1);
    expect(counted.length, `progress states seen: ${seen.join(', ')}`).toBeGreaterThan(1);
    expect(new Set(counted.map(([done]) => done)).size).toBeGreaterThan(1);
    await page.getByRole('dialog', { name: 'Export' }).getByText('The plan set is downloading.').waitFor();
  });

  it('the PDF carries every part\'s finished size, the cut list, the revision and the workshop', () => {
    const pages = pdfText.split('\f').filter((p) => p.trim());
    const letters = partLetters(result);
    for (const part of result.parts) {
      const drawing = pages.find((p) => p.includes(`Part ${letters.get(part.id)}: ${part.name}`));
      expect(drawing, `no drawing for ${part.name}`).toBeDefined();
      expect(drawing).toContain(partSizeText(part, 'in'));
    }
    const cutList = pages.filter((p) => p.includes('Cut list —')).join('\n');
    for (const part of result.parts) {
      expect(cutList).toContain(part.name);
      expect(cutList).toContain(lengthText(part.lengthMm, 'in'));
    }
    for (const p of pages) {
      expect(p).toMatch(new RegExp(`REVISION[\\s\\S]*\\b${head}\\b`));
      expect(p).toContain(DEMO_WORKSHOP);
      expect(p).toContain(CHEST_TITLE);
    }
    expect(pdfText).toContain('Safety notes');
  });

  it('costs the materials from the workshop\'s price list (the demo workshop has one)', () => {
    // The materials pages: the cost table, then the priced shopping list (on a continued page when the first is full).
    const cost = pdfText.split('\f').find((p) => p.includes('Cost (USD)'));
    expect(cost, 'no cost table').toBeDefined();
    expect(cost).toMatch(/Total\s+\$?[\d,]+\.\d\d/);
    expect(pdfText).toContain('Shopping list (USD)');
  });

  it('lays the materials out on the workshop\'s stock: its white oak boards on hand are cut first', () => {
    const pages = pdfText.split('\f');
    const words = (text: string) => text.split(/\s+/).map((w) => w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('\\s+');
    expect(pdfText).toMatch(new RegExp(words(`Laid out on the stock of ${DEMO_WORKSHOP}:`)));
    const oak = pages.find((p) => p.includes('Cutting diagrams: White oak 4/4') && /Board \d+ of/.test(p));
    expect(oak, 'no white oak 4/4 diagrams').toBeDefined();
    expect(oak).toMatch(/Board 1 of \d+ \(in stock\)/);
  });

  it('embeds JetBrains Mono', () => {
    const fonts = execFileSync('pdffonts', [pdfPath], { encoding: 'utf8' });
    expect(fonts).toMatch(/JetBrainsMono\S*\s+CID TrueType\s+Identity-H\s+yes/);
  });

  it('renders the overall views and a part drawing to images for a person to look at', () => {
    const pages = pdfText.split('\f');
    const overall = pages.findIndex((p) => p.includes('Overall views') && !p.includes('Key numbers')) + 1;
    const part = pages.findIndex((p) => p.includes('Part B:')) + 1;
    for (const [n, name] of [[overall, 'overall'], [part, 'part-b']] as const) {
      expect(n).toBeGreaterThan(0);
      execFileSync('pdftoppm', ['-png', '-r', '110', '-f', String(n), '-l', String(n), '-singlefile', pdfPath, join(SCREENSHOT_DIR, `export-pdf-${name}`)]);
      expect(existsSync(join(SCREENSHOT_DIR, `export-pdf-${name}.png`))).toBe(true);
    }
  });

  it('downloads the front view as SVG and the cut list as CSV', async () => {
    await openExportMenu();
    const svg = await download(() => page.getByRole('button', { name: 'Front view' }).click());
    expect(svg.name).toBe(`blanket-chest-white-oak-r${head}-front.svg`);
    const svgText = readFileSync(svg.path, 'utf8');
    expect(svgText).toContain('<svg');
    expect(svgText.replace(/&quot;/g, '"')).toContain(`overall-width=${lengthText(result.bboxMm[0], 'in')}`);

    const csv = await download(() => page.getByRole('button', { name: 'Cut list (CSV)' }).click());
    const csvText = readFileSync(csv.path, 'utf8');
    expect(csvText.startsWith('\uFEFF')).toBe(true);
    expect(csvText).toContain('Finished length (in)');
    for (const part of result.parts) expect(csvText).toContain(part.name);
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'export-menu.png') });
  });
});
