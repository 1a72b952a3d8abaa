/**
 * Two people save the same design from the same revision: the demo owner and the demo designer,
 * each in their own browser. The second save is refused with "someone saved a newer revision";
 * the designer can fork their edit or load the owner's revision, and nothing anyone typed is lost.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { formatLength, parseLength } from '../../shared/units/index.ts';
import { seedDemo } from '../../server/db/seed.ts';
import { launchBrowser, SCREENSHOT_DIR } from '../support/browser.ts';
import { startTestServer } from '../support/testApp.ts';

interface DemoAccounts {
  password: string;
  accounts: { role: string; email: string; name: string }[];
}
const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as DemoAccounts;
const person = (role: string) => demo.accounts.find((a) => a.role === role)!;

const DESIGN_TITLE = 'Toy chest, white oak (from the blanket chest)';
const INCH = { unit: 'in', precision: 16 } as const;

let server: Awaited<ReturnType<typeof startTestServer>>;
let designerBrowser: Awaited<ReturnType<typeof launchBrowser>>;
let ownerBrowser: Awaited<ReturnType<typeof launchBrowser>>;
let mine: Page;
let theirs: Page;
let designId = '';

beforeAll(async () => {
  if (!existsSync('dist/index.html')) throw new Error('Build the client first (npm test does: vite build)');
  server = await startTestServer();
  await seedDemo(server.sequelize);
  designerBrowser = await launchBrowser();
  ownerBrowser = await launchBrowser();
  mine = await designerBrowser.context.newPage();
  theirs = await ownerBrowser.context.newPage();
});
afterAll(async () => {
  await designerBrowser?.close();
  await ownerBrowser?.close();
  await server?.close();
});

async function signIn(page: Page, role: string) {
  await page.goto(`${server.url}/signin`);
  await page.getByLabel('E-mail').fill(person(role).email);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/workshops\/[0-9a-f-]{36}$/);
}

async function openDesign(page: Page) {
  await page.goto(`${server.url}/designs/${designId}`);
  await page.locator('table[aria-label="Cut list"]').waitFor();
}

/** A design's head as the API has it, read through `page`'s session. */
async function head(page: Page, id: string): Promise<{ number: number; spec: PieceSpec; title: string }> {
  return page.evaluate(async (designId) => {
    const body = await (await fetch(`/api/designs/${designId}`)).json();
    return { number: body.head.number, spec: body.headRevision.spec, title: body.title };
  }, id);
}

async function edit(page: Page, label: string, text: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.fill(text);
  await field.blur();
  await page.getByRole('heading', { level: 1 }).filter({ hasText: 'unsaved changes' }).waitFor();
}

async function save(page: Page, message: string) {
  await page.getByLabel('Revision message').fill(message);
  await page.getByRole('button', { name: 'Save revision' }).click();
}

describe('two saves from the same revision', () => {
  it('refuses the second with "someone saved a newer revision" and overwrites nothing', async () => {
    await signIn(mine, 'designer');
    await mine.getByRole('link', { name: DESIGN_TITLE }).click();
    await mine.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    designId = mine.url().split('/').pop()!;
    await mine.locator('table[aria-label="Cut list"]').waitFor();
    await signIn(theirs, 'owner');
    await openDesign(theirs);
    const base = await head(mine, designId);

    await edit(theirs, 'Width over the legs', '40"');
    await edit(mine, 'Width over the legs', '38 1/2"');
    await save(theirs, 'Forty inches for the nursery wall');
    await theirs.getByRole('heading', { level: 1 }).filter({ hasText: `r${base.number + 1}` }).waitFor();

    await save(mine, 'Narrower to clear the radiator');
    const dialog = mine.getByRole('alertdialog');
    await dialog.getByText('Someone saved a newer revision').waitFor();
    const said = await dialog.innerText();
    expect(said).toContain(`Revision ${base.number + 1} by ${person('owner').name}`);
    expect(said).toContain('Nothing was overwritten');
    await dialog.getByRole('button', { name: 'Load theirs (drop my changes)' }).waitFor();
    await dialog.getByRole('button', { name: 'Fork mine' }).waitFor();
    await mine.screenshot({ path: join(SCREENSHOT_DIR, 'save-conflict.png') });

    // The owner's revision is the head; the designer's edit is still on their screen.
    const now = await head(mine, designId);
    expect(now.number).toBe(base.number + 1);
    expect(now.spec.params.width).toBeCloseTo(parseLength('40"'), 9);
    expect(await mine.getByLabel('Width over the legs', { exact: true }).inputValue()).toBe('38 1/2"');
  });

  it('forks the refused edit into a design of its own, keeping every value typed', async () => {
    await mine.getByRole('alertdialog').getByRole('button', { name: 'Fork mine' }).click();
    await mine.waitForURL((url) => url.pathname.startsWith('/designs/') && !url.pathname.endsWith(designId));
    const forkId = mine.url().split('/').pop()!;
    await mine.locator('table[aria-label="Cut list"]').waitFor();
    await mine.getByText('forked from').first().waitFor();
    expect(await mine.getByLabel('Width over the legs', { exact: true }).inputValue()).toBe('38 1/2"');
    const fork = await head(mine, forkId);
    expect(fork.spec.params.width).toBeCloseTo(parseLength('38 1/2"'), 9);
    expect(fork.title).toContain('(my variation)');
    // The original keeps the owner's revision as its head.
    expect((await head(mine, designId)).spec.params.width).toBeCloseTo(parseLength('40"'), 9);
  });

  it('loads their revision instead, when the maker chooses to drop the edit', async () => {
    await openDesign(mine);
    await openDesign(theirs);
    const base = await head(mine, designId);
    await edit(theirs, 'Depth over the legs', '18"');
    await edit(mine, 'Depth over the legs', '17"');
    await save(theirs, 'An inch shallower');
    await theirs.getByRole('heading', { level: 1 }).filter({ hasText: `r${base.number + 1}` }).waitFor();
    await save(mine, 'Two inches shallower');
    await mine.getByRole('alertdialog').getByRole('button', { name: 'Load theirs (drop my changes)' }).click();
    await mine.getByRole('alertdialog').waitFor({ state: 'detached' });
    expect(await mine.getByLabel('Depth over the legs', { exact: true }).inputValue()).toBe(formatLength(parseLength('18"'), INCH));
    const title = await mine.getByRole('heading', { level: 1 }).innerText();
    expect(title).toContain(`r${base.number + 1}`);
    expect(title).not.toContain('unsaved');
  });
});
