/// <reference lib="dom" />  // page.evaluate bodies run in the browser
import { readFile } from 'node:fs/promises';
import { PDFParse } from 'pdf-parse';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, screenshot, signInAs } from './browser';

// The herd and show records screens in a real browser, against the full demo season. Files are
// written here, in the shapes breeders and show secretaries send: their own headers, semicolons,
// a byte-order mark, and rows with mistakes.

const BOM = '\uFEFF';
const SHOW = 'Keeperline Test Show';

let browser: Browser;
let rabbitryId: number;
let clubId: number;
beforeAll(async () => {
  browser = await launchBrowser();
  const page = await pageFor('owner@example.test');
  const me = (await page.evaluate(() => fetch('/api/session').then((r) => r.json()))) as { user: { rabbitries: { id: number }[]; clubs: { id: number }[] } };
  rabbitryId = me.user.rabbitries[0]!.id;
  clubId = me.user.clubs[0]!.id;
  await page.close();
});
afterAll(async () => {
  await browser.close();
});

async function pageFor(email: string, viewport = DESKTOP): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signInAs(page, email);
  return page;
}

/**
 * The frame scrolls inside its content area, so a whole-screen shot needs a viewport as tall as
 * that content; the viewport is restored afterwards.
 */
async function fullScreenshot(page: Page, name: string): Promise<void> {
  const size = page.viewportSize()!;
  const content = await page.evaluate(() => document.querySelector('mat-sidenav-content')?.scrollHeight ?? document.body.scrollHeight);
  await page.setViewportSize({ width: size.width, height: Math.min(Math.max(content + 64, size.height), 8000) });
  await page.waitForTimeout(200);
  await screenshot(page, name);
  await page.setViewportSize(size);
}

/** A screen opened afresh at phone width (as on a phone, not a desktop window narrowed), captured whole. */
async function phoneShot(email: string, path: string, ready: string, name: string): Promise<void> {
  const page = await pageFor(email, PHONE);
  await page.goto(`${baseUrl()}${path}`);
  await page.locator(ready).first().waitFor();
  await page.waitForTimeout(300);
  expect(Number(await page.evaluate('document.documentElement.scrollWidth - window.innerWidth')), name).toBeLessThanOrEqual(0);
  await fullScreenshot(page, name);
  await page.close();
}

const api = <T>(page: Page, path: string) => page.evaluate((p) => fetch(p).then((r) => r.json()), path) as Promise<T>;

interface ImportRun {
  counts: Record<string, number>;
  problems: string[];
  outcome: string;
}

/** Drives the wizard from the file to the final message, leaving rows with errors out when asked. */
async function importFile(
  page: Page, scope: string, file: { name: string; text: string; kind?: string }, leaveErrorsOut: boolean, checkShot?: string,
): Promise<ImportRun> {
  await page.goto(`${baseUrl()}${scope}/imports`);
  if (file.kind) await page.getByRole('radio', { name: file.kind }).check();
  await page.locator('input[type="file"]').setInputFiles({ name: file.name, mimeType: 'text/csv', buffer: Buffer.from(file.text, 'utf8') });
  await page.locator('.preview').waitFor();
  await page.getByRole('button', { name: 'Upload' }).click();
  await page.getByRole('button', { name: 'Next: match the columns' }).click();
  await page.getByRole('button', { name: 'Check the rows' }).click();
  await page.getByRole('button', { name: 'Next: import' }).waitFor({ timeout: 30_000 });
  const counts = Object.fromEntries(
    await page.locator('.counts > div').evaluateAll((divs) => divs.map((d) => [d.querySelector('dt')!.textContent!.trim(), Number(d.querySelector('dd')!.textContent)])),
  ) as Record<string, number>;
  const problems = (await page.locator('.problems tr.mat-mdc-row').allInnerTexts()).map((t) => t.replace(/\s+/g, ' ').trim());
  if (checkShot) await fullScreenshot(page, checkShot);
  await page.getByRole('button', { name: 'Next: import' }).click();
  const importButton = page.getByRole('button', { name: 'Import', exact: true });
  if ((counts['Rows with errors'] ?? 0) > 0) {
    expect(await importButton.isDisabled()).toBe(true);
    if (!leaveErrorsOut) return { counts, problems, outcome: '' };
    await page.getByLabel('Leave the rows with errors out').check();
  }
  await importButton.click();
  const outcome = (await page.locator('.outcome').innerText({ timeout: 30_000 })).trim();
  return { counts, problems, outcome };
}

describe('records: imports, herd, animal, litters, shows', () => {
  let sireEarId: string;
  let damEarId: string;

  it('imports animals from a semicolon file with a BOM, shows the bad rows, and adds nothing the second time', async () => {
    const page = await pageFor('owner@example.test');
    // Parents from the demo herd: its youngest buck and doe, so the new kits have a deep pedigree.
    type Page1 = { rows: { earId: string }[] };
    const herd = `/api/rabbitries/${rabbitryId}/animals?sort=birthDate&dir=desc&pageSize=1&status=active`;
    sireEarId = (await api<Page1>(page, `${herd}&sex=buck`)).rows[0]!.earId;
    damEarId = (await api<Page1>(page, `${herd}&sex=doe`)).rows[0]!.earId;
    const text = `${BOM}Tattoo;Name;Sex;Breed;Colour;Date of birth;Sire;Dam;Line\r\n`
      + `KT01;Hazelby;doe;Mini Rex;Castor;2026-03-02;${sireEarId};${damEarId};Ember\r\n`
      + `KT02;;buck;Mini Rex;Black;2026-04-10;;;Slate\r\n`
      + 'KT03;Muddle;x;Mini Rex;Blue;2026-04-10;;;\r\n'
      + 'KT04;Later;doe;Mini Rex;Blue;2031-01-01;;;\r\n'
      + 'KT05;;doe;Giant Unknownish;Blue;2026-04-10;;;\r\n';

    const first = await importFile(page, `/r/${rabbitryId}`, { name: 'my herd (semicolons).csv', text }, true, 'records-imports-check-desktop');
    expect(first.counts).toMatchObject({ 'Rows read': 5, New: 2, 'Already present': 0, 'Rows with errors': 3 });
    expect(first.problems.some((p) => p.startsWith('4 Sex error'))).toBe(true);
    expect(first.problems.some((p) => p.startsWith('5 Born error') && p.includes('in the future'))).toBe(true);
    expect(first.problems.some((p) => p.startsWith('6 Breed error') && p.includes('not in the breed catalogue'))).toBe(true);
    expect(first.outcome).toBe('2 new, 0 already present');
    await fullScreenshot(page, 'records-imports-done-desktop');

    const again = await importFile(page, `/r/${rabbitryId}`, { name: 'my herd (semicolons).csv', text }, true);
    expect(again.counts).toMatchObject({ New: 0, 'Already present': 2 });
    expect(again.outcome).toBe('0 new, 2 already present');

    // The history lists both runs with their outcome and a link to each problems report.
    const history = await page.locator('kl-import-history tr.mat-mdc-row').allInnerTexts();
    expect(history[0]).toContain('0 new, 2 already present');
    expect(history[1]).toContain('2 new, 0 already present');
    const report = await page.evaluate((href) => fetch(href).then((r) => r.text()),
      (await page.locator('kl-import-history td a[download]').first().getAttribute('href'))!);
    expect(report.split('\n')[0]).toBe('row,column,severity,problem');
    expect(report).toContain('4,sex,error');
    await page.close();
  });

  it('imports weights in lb-oz, with the shorthand, a weight without a unit and an unknown ear ID', async () => {
    const page = await pageFor('owner@example.test');
    const text = 'Tattoo,Date weighed,Weight\n'
      + 'KT01,2026-05-01,1 lb 12 oz\n'
      + 'KT01,2026-06-01,3-2\n'
      + 'KT01,2026-08-01,4 lb 4 oz\n'
      + 'KT01,2026-11-20,4 lb 12 oz\n'
      + 'KT02,2026-11-20,4 lb 1 oz\n'
      + 'KT01,2026-09-01,5.2\n'
      + 'ZZ999,2026-09-01,4 lb\n';
    const first = await importFile(page, `/r/${rabbitryId}`, { name: 'scale.csv', text, kind: 'Weights' }, true);
    expect(first.counts).toMatchObject({ 'Rows read': 7, New: 5, 'Rows with errors': 1, 'Rows skipped': 1 });
    expect(first.problems.find((p) => p.startsWith('7 '))).toContain('has no unit');
    expect(first.problems.find((p) => p.startsWith('8 '))).toContain('ZZ999 is not in the herd');
    expect(first.outcome).toBe('5 new, 0 already present');
    const again = await importFile(page, `/r/${rabbitryId}`, { name: 'scale.csv', text, kind: 'Weights' }, true);
    expect(again.outcome).toBe('0 new, 5 already present');
    await page.close();
  });

  it('imports a secretary’s results file for the club and shows the results with their awards', async () => {
    const page = await pageFor('officer@example.test');
    const row = (exhibitor: string, ear: string, place: string, awards = '', ageClass = 'senior') =>
      `${SHOW};2026-11-21;R. Testwood;${exhibitor};Mini Rex;Castor;doe;${ageClass};6;3;${place};${ear};${awards};Ostwick Hall\r\n`;
    const text = `${BOM}Show;Date;Judge;Exhibitor;Breed;Color;Sex;Class;Entries;Exhibitors;Place;Tattoo;Awards;Venue\r\n`
      + row('Brackenfold Rabbitry', 'KT01', '1', 'BOV BOB')
      + row('Larrimore Glen Rabbits', 'W9901', '2')
      + row('Quenmoor Rabbitry', 'J9901', '3')
      + row('Quenmoor Rabbitry', 'J9902', '4', '', 'elder')
      + row('Quenmoor Rabbitry', 'J9903', 'first');
    const first = await importFile(page, `/c/${clubId}`, { name: 'winter results.csv', text }, false);
    expect(first.counts).toMatchObject({ 'Rows read': 5, New: 3, 'Rows with errors': 2 });
    expect(first.problems.find((p) => p.startsWith('5 '))).toMatch(/Age class/);
    expect(first.problems.find((p) => p.startsWith('6 '))).toMatch(/Placing/);
    // Refused while errors exist: the button stays off until the officer leaves those rows out.
    expect(first.outcome).toBe('');
    await page.getByLabel('Leave the rows with errors out').check();
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    expect((await page.locator('.outcome').innerText({ timeout: 30_000 })).trim()).toBe('3 new, 0 already present');

    const again = await importFile(page, `/c/${clubId}`, { name: 'winter results.csv', text }, true);
    expect(again.outcome).toBe('0 new, 3 already present');

    await page.goto(`${baseUrl()}/c/${clubId}/shows`);
    await page.locator('mat-button-toggle', { hasText: 'All shows' }).click();
    const showRow = page.locator('tr.mat-mdc-row', { hasText: SHOW });
    expect(await showRow.innerText()).toMatch(/\b3\b/);
    await fullScreenshot(page, 'records-shows-desktop');
    await showRow.getByRole('link', { name: SHOW }).click();
    await page.waitForURL(/\/shows\/\d+$/);
    const resultRows = page.locator('kl-show-results tr.mat-mdc-row');
    await resultRows.first().waitFor();
    const results = await resultRows.allInnerTexts();
    expect(results).toHaveLength(3);
    expect(results[0]).toContain('Mini Rex · Castor · Senior doe');
    expect(results[0]).toMatch(/1st\s+of 6/);
    expect(await resultRows.first().locator('.award').evaluateAll((els) => els.map((e) => e.firstChild?.textContent))).toEqual(['BOV', 'BOB']);
    expect(await page.locator('.award').first().getAttribute('title')).toBe('Best of variety');
    await fullScreenshot(page, 'records-show-results-desktop');
    const resultsPath = new URL(page.url()).pathname;
    await page.close();
    await phoneShot('officer@example.test', resultsPath, 'kl-show-results tr.mat-mdc-row', 'records-show-results-phone');
    await phoneShot('officer@example.test', `/c/${clubId}/shows`, 'kl-shows tr.mat-mdc-row', 'records-shows-phone');
  });

  it('finds the new animals in the herd table and its CSV', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${rabbitryId}/herd`);
    await page.getByLabel('Search ear ID or name').fill('KT0');
    await expect.poll(() => page.locator('tr.mat-mdc-row').count()).toBe(2);
    const rows = await page.locator('tr.mat-mdc-row').allInnerTexts();
    expect(rows[0]).toMatch(/KT01\s+Hazelby\s+Doe\s+Mini Rex\s+Castor/);
    expect(rows[0]).toContain('4 lb 12 oz');
    expect(page.url()).toContain('q=KT0');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download CSV' }).click()]);
    const csv = await readFile((await download.path())!, 'utf8');
    expect(csv.split('\r\n')[0]).toContain('Ear ID,Name,Sex,Breed');
    expect(csv).toContain('KT01,Hazelby,doe,Mini Rex,Castor');
    expect(csv).not.toContain('BF0');

    await page.getByLabel('Search ear ID or name').fill('');
    await expect.poll(() => page.locator('tr.mat-mdc-row').count()).toBeGreaterThan(10);
    await fullScreenshot(page, 'records-herd-desktop');
    await page.close();
    await phoneShot('owner@example.test', `/r/${rabbitryId}/herd`, 'kl-herd tr.mat-mdc-row', 'records-herd-phone');
  });

  it('adds an animal by hand with an outside dam, the form checking as one types', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${rabbitryId}/herd`);
    await page.getByRole('button', { name: 'Add animal' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Ear ID (tattoo)').fill('KT 06!');
    expect(await dialog.locator('mat-error').first().innerText()).toContain('An ear ID starts with a letter or digit');
    await dialog.getByLabel('Ear ID (tattoo)').fill('KT06');
    await dialog.getByRole('combobox', { name: 'Sex' }).click();
    await page.getByRole('option', { name: 'Doe' }).click();
    await dialog.getByRole('combobox', { name: 'Breed' }).click();
    await page.getByRole('option', { name: 'Mini Rex' }).click();
    await dialog.getByLabel('Born').fill('2026-10-01');
    await dialog.getByLabel('Sire (ear ID)').fill('KT02');
    await dialog.getByLabel('Dam (ear ID)').fill('OUT77');
    await dialog.getByRole('heading', { name: 'Add an animal' }).click(); // a click outside closes the ear ID suggestions
    await dialog.getByLabel('Record parents not yet in the herd as outside parents (stubs)').check();
    await dialog.getByRole('button', { name: 'Add animal' }).click();
    await expect.poll(() => page.locator('mat-snack-bar-container').innerText()).toContain('KT06 is now in the herd.');
    await page.close();
  });

  it('shows an animal’s profile: pedigree, weights with the flag, show record, and the certificate’s ancestors', async () => {
    const page = await pageFor('owner@example.test');
    const kit = (await api<{ rows: { id: number }[] }>(page, `/api/rabbitries/${rabbitryId}/animals?q=KT01`)).rows[0]!;
    await page.goto(`${baseUrl()}/r/${rabbitryId}/animals/${kit.id}`);
    await page.locator('kl-pedigree-tree').waitFor();
    expect(await page.locator('h1').innerText()).toBe('KT01 Hazelby');
    const tree = page.locator('kl-pedigree-tree');
    expect(await tree.innerText()).toContain(sireEarId);
    expect(await tree.innerText()).toContain(damEarId);
    // Over the breed's senior maximum in the catalogue (4 lb 8 oz, from memory): a flag, with the caution.
    const flag = page.locator('.flag.risk');
    expect(await flag.innerText()).toContain('Latest weight 4 lb 12 oz on 2026-11-20 (senior) is over the maximum of 4 lb 8 oz: disqualification risk.');
    expect(await flag.innerText()).toContain('check them against the current official standard');
    expect(await page.locator('kl-weights-panel tr.mat-mdc-row').count()).toBe(4);
    await page.locator('kl-weight-chart svg').waitFor();
    const record = page.locator('kl-show-record-panel');
    expect(await record.innerText()).toMatch(/[12] legs? toward grand champion/);
    expect(await record.innerText()).toContain('1st of 6');

    // Typing a weight: the parser's message as one types, then what will be stored.
    const weight = page.getByLabel('Weight', { exact: true });
    await weight.fill('4.9');
    expect(await page.locator('kl-weights-panel mat-error').innerText()).toContain('"4.9" has no unit');
    await weight.fill('4-9');
    expect(await page.locator('kl-weights-panel mat-hint').first().innerText()).toBe('= 4 lb 9 oz (2070 g)');

    await fullScreenshot(page, 'records-animal-desktop');
    await phoneShot('owner@example.test', `/r/${rabbitryId}/animals/${kit.id}`, 'kl-weight-chart svg', 'records-animal-phone');

    // The certificate holds every recorded ancestor of the four generations.
    type Node = { earId: string; sire?: Node | null; dam?: Node | null };
    const { tree: pedigree } = await api<{ tree: Node }>(page, `/api/rabbitries/${rabbitryId}/animals/${kit.id}/pedigree?generations=4`);
    const ancestors: string[] = [];
    const walk = (n: Node | null | undefined) => {
      if (!n) return;
      ancestors.push(n.earId);
      walk(n.sire);
      walk(n.dam);
    };
    walk(pedigree.sire);
    walk(pedigree.dam);
    expect(ancestors.length).toBeGreaterThanOrEqual(14);
    await page.getByRole('combobox', { name: 'Paper' }).click();
    await page.getByRole('option', { name: 'A4' }).click();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Pedigree certificate (PDF)' }).click()]);
    expect(download.url()).toContain('paper=a4');
    const pdf = new PDFParse({ data: await readFile((await download.path())!) });
    const text = (await pdf.getText()).text;
    await pdf.destroy();
    expect(text).toContain('KT01');
    for (const earId of ancestors) expect(text, earId).toContain(earId);
    await page.close();
  });

  it('records a breeding and shows the expected kindling window with the cautions', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${rabbitryId}/litters`);
    await page.getByRole('button', { name: 'Record a breeding' }).first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Dam (ear ID)').fill('KT01');
    await dialog.getByLabel('Sire (ear ID)').fill('KT02');
    await dialog.getByLabel('Bred on').fill('2026-11-25');
    // Gestation 31–32 days, range 29–35 (common practice): 2026-12-26 – 12-27, range 12-24 to 12-30.
    expect(await dialog.locator('mat-hint').first().innerText()).toBe('Expected 2026-12-26 – 12-27 (range 2026-12-24 to 2026-12-30)');
    await dialog.getByRole('button', { name: 'Record breeding' }).click();
    await expect.poll(() => page.locator('mat-snack-bar-container').innerText()).toContain('saved');
    await page.getByLabel('Find a litter, sire or dam').fill('KT01');
    const row = page.locator('tr.mat-mdc-row').first();
    // The table reloads after the save; the new litter appears once the answer is in.
    await expect.poll(() => row.innerText()).toContain('2026-12-26 – 12-27');
    expect(await row.innerText()).toMatch(/due in \d+ days?|due now/);
    expect(await page.locator('.caution').innerText()).toContain('A veterinarian answers health questions');
    await page.getByLabel('Find a litter, sire or dam').fill('');
    await fullScreenshot(page, 'records-litters-desktop');
    await page.close();
    await phoneShot('owner@example.test', `/r/${rabbitryId}/litters`, 'kl-litters tr.mat-mdc-row', 'records-litters-phone');
  });

  it('shows a mentor the import history without the wizard', async () => {
    const page = await pageFor('mentor@example.test');
    await page.goto(`${baseUrl()}/r/${rabbitryId}/imports`);
    await page.locator('kl-import-history tr.mat-mdc-row').first().waitFor();
    expect(await page.locator('kl-import-wizard').count()).toBe(0);
    expect(await page.locator('main').innerText()).toContain('Only the owner and partners import files');
    await page.close();
  });

  it('shows the imports wizard and the breed catalogue at desktop and phone width', async () => {
    for (const [name, viewport] of [['desktop', DESKTOP], ['phone', PHONE]] as const) {
      const owner = await pageFor('owner@example.test', viewport);
      await owner.goto(`${baseUrl()}/r/${rabbitryId}/imports`);
      await owner.locator('input[type="file"]').setInputFiles({ name: 'weights.csv', mimeType: 'text/csv', buffer: Buffer.from('ear_id,weighed_on,weight\nKT01,2026-11-28,4 lb 11 oz\n') });
      await owner.locator('.preview').waitFor();
      await owner.locator('kl-import-history tr.mat-mdc-row').first().waitFor();
      await fullScreenshot(owner, `records-imports-${name}`);
      expect(Number(await owner.evaluate('document.documentElement.scrollWidth - window.innerWidth'))).toBeLessThanOrEqual(0);
      await owner.close();

      const admin = await pageFor('admin@example.test', viewport);
      await admin.goto(`${baseUrl()}/admin/breeds`);
      await admin.locator('tr.mat-mdc-row').first().waitFor();
      expect(await admin.locator('main').innerText()).toContain('check every class scheme, weight limit and point');
      await admin.locator('tr.mat-mdc-row', { hasText: 'Mini Rex' }).getByRole('button', { name: 'Edit Mini Rex' }).click();
      await admin.locator('kl-breed-editor').waitFor();
      await fullScreenshot(admin, `records-breeds-${name}`);
      expect(Number(await admin.evaluate('document.documentElement.scrollWidth - window.innerWidth'))).toBeLessThanOrEqual(0);
      await admin.close();
    }
  });

  it('keeps the breed catalogue from anyone but an administrator', async () => {
    const page = await pageFor('owner@example.test');
    expect(await page.getByRole('link', { name: 'Breed catalogue' }).count()).toBe(0);
    await page.goto(`${baseUrl()}/admin/breeds`);
    await expect.poll(() => page.locator('main').innerText()).toContain('Nothing here');
    await page.close();
  });

  it('lets the officer delete the test show again, results and all', async () => {
    const page = await pageFor('officer@example.test');
    await page.goto(`${baseUrl()}/c/${clubId}/shows`);
    await page.locator('mat-button-toggle', { hasText: 'All shows' }).click();
    await page.getByRole('button', { name: `Delete ${SHOW}` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete show' }).click();
    await expect.poll(() => page.locator('mat-snack-bar-container').innerText()).toContain(`${SHOW} deleted.`);
    await expect.poll(() => page.locator('tr.mat-mdc-row', { hasText: SHOW }).count()).toBe(0);
    await page.close();
  });
});
