/// <reference lib="dom" />  // page.evaluate bodies run in the browser
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, chartTextFills, chartWords, DESKTOP, downloadFrom, launchBrowser, panelScreenshots, signedInPage } from './browser';

let browser: Browser;
let herdId: number;

beforeAll(async () => {
  browser = await launchBrowser();
  const page = await pageFor('owner@example.test');
  const me = (await page.evaluate(() => fetch('/api/session').then((r) => r.json()))) as { user: { rabbitries: { id: number; name: string }[] } };
  herdId = me.user.rabbitries.find((r) => r.name === 'Brackenfold Rabbitry')!.id;
  await page.close();
});
afterAll(async () => { await browser.close(); });

const pageFor = (email: string, scheme: 'light' | 'dark' = 'light') => signedInPage(browser, email, DESKTOP, scheme);

/** Text the panel's nth SVG chart drew. */
const chartText = (page: Page, nth = 0) => chartWords(page.locator('kl-panel-chart').nth(nth));

/** The first rows of the keeper board, as ear IDs in rank order. */
const boardOrder = (page: Page) => page.locator('tr.main-row').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-ear-id')));

/** WCAG relative luminance of an rgb()/hex colour ECharts wrote. */
function luminance(colour: string): number {
  const hex = /^#([0-9a-f]{6})/i.exec(colour)?.[1];
  const rgb = hex ? [0, 2, 4].map((i) => parseInt(hex.slice(i, i + 2), 16)) : /(\d+)[\s,]+(\d+)[\s,]+(\d+)/.exec(colour)!.slice(1, 4).map(Number);
  const [r, g, b] = rgb.map((v) => (v / 255 <= 0.03928 ? v / 255 / 12.92 : ((v / 255 + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

describe('breeder analysis panels', () => {
  it('the owner ranks juniors on the keeper board, and the ranking follows the weights', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}`);
    // The four panels are in the rabbitry's navigation.
    for (const label of ['Keeper board', 'Sires & dams', 'Trait inheritance', 'Growth curves']) {
      await expect.poll(() => page.getByRole('link', { name: label, exact: true }).count()).toBe(1);
    }
    await page.getByRole('link', { name: 'Keeper board', exact: true }).click();
    await page.waitForURL(`**/r/${herdId}/keepers`);
    await expect.poll(() => page.locator('tr.main-row').count()).toBeGreaterThan(1);
    await expect.poll(() => chartText(page)).toEqual(expect.arrayContaining(['Breeding value', 'Weight on target', 'Index total']));
    expect(await page.locator('kl-panel-chart svg path').count()).toBeGreaterThan(5);
    expect(await page.locator('.explain').first().innerText()).toMatch(/^Ranked 1st/);
    // Keep / Sell / Undecided are a toggle group: radios to assistive technology.
    expect(await page.getByRole('radio', { name: 'Keep' }).count()).toBeGreaterThan(0);
    const before = await boardOrder(page);

    // Leave the breeding value out and let weight on target lead: the demo's juniors differ most there.
    await page.locator('#weight-breedingValue').focus();
    await page.keyboard.press('Home');
    await page.locator('#weight-weightOnTarget').focus();
    await page.keyboard.press('End');
    await page.waitForURL((u) => u.search.includes('weightOnTarget%3A5') || u.search.includes('weightOnTarget:5'));
    await expect.poll(async () => (await boardOrder(page)).slice(0, 3).join(), { timeout: 10_000 }).not.toBe(before.slice(0, 3).join());
    await expect.poll(() => chartText(page)).not.toContain('Breeding value');

    const csv = await downloadFrom(page, 'Download CSV');
    expect(csv.name).toMatch(/keeper-board.*\.csv$/);
    expect(csv.text).toContain('Rank,Ear ID,Name');
    expect(csv.text.split('\n').length).toBeGreaterThan(2);
    const png = await downloadFrom(page, 'Save chart as PNG');
    expect(png.name).toMatch(/\.png$/);
    await panelScreenshots(page, 'panel-keepers');
    await page.close();
  });

  it('a mentor reads the keeper board without Keep or Sell controls', async () => {
    const page = await pageFor('mentor@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}/keepers`);
    await expect.poll(() => page.locator('tr.main-row').count()).toBeGreaterThan(1);
    expect(await page.locator('mat-button-toggle-group').count()).toBe(0);
    expect(await page.getByRole('radio', { name: /^(Keep|Sell|Undecided)$/ }).count()).toBe(0);
    expect(await page.locator('mat-button-toggle').count()).toBe(0);
    expect(await page.locator('.decision').count()).toBeGreaterThan(1);
    expect(await page.locator('.read-only').innerText()).toContain('as a mentor');
    await page.close();
  });

  it('the owner compares sires and dams by their offspring’s placings', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}/sires-dams`);
    await expect.poll(() => page.locator('tr.mat-mdc-row').count()).toBeGreaterThan(1);
    await expect.poll(() => chartText(page)).toEqual(expect.arrayContaining(['Top-3 share', '95 % interval', 'Offspring entries placed in the top 3 (%)']));
    // The chart's words are drawn in plain colours: ECharts cannot read the theme's light-dark() values.
    const fills = await chartTextFills(page.locator('kl-panel-chart'));
    expect(fills.length).toBeGreaterThan(5);
    for (const fill of fills) expect(fill).toMatch(/^(rgb|#)/);
    expect(Math.max(...fills.map((f) => luminance(f!)))).toBeLessThan(0.3);
    await page.getByRole('radio', { name: 'Dams' }).click();
    await page.waitForURL((u) => u.search.includes('parent=dam'));
    await expect.poll(() => page.locator('th').filter({ hasText: /^Dam$/ }).count()).toBe(1);
    const csv = await downloadFrom(page, 'Download CSV');
    expect(csv.text).toContain('Dam ear ID');
    await panelScreenshots(page, 'panel-sires-dams');
    const first = page.locator('tr.mat-mdc-row a.ear-id').first();
    const earId = await first.innerText();
    await first.click();
    await page.waitForURL(/\/animals\/\d+$/);
    await expect.poll(() => page.locator('main').innerText()).toContain(earId);
    await page.close();
  });

  it('draws the charts in the dark scheme’s colours when the system asks for dark', async () => {
    const page = await pageFor('owner@example.test', 'dark');
    await page.goto(`${baseUrl()}/r/${herdId}/sires-dams`);
    await expect.poll(() => chartText(page), { timeout: 10_000 }).toContain('95 % interval');
    const fills = await chartTextFills(page.locator('kl-panel-chart'));
    for (const fill of fills) expect(fill).toMatch(/^(rgb|#)/);
    // Light words on the dark surface: every word at least as light as a mid grey.
    expect(Math.min(...fills.map((f) => luminance(f!)))).toBeGreaterThan(0.2);
    await panelScreenshots(page, 'panel-sires-dams-dark');
    await page.close();
  });

  it('says what to change when no parent meets the filters', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}/sires-dams?minEntries=1000`);
    await expect.poll(() => page.locator('.empty h2').innerText(), { timeout: 10_000 }).toBe('No sires match these filters');
    await panelScreenshots(page, 'panel-sires-dams-empty');
    await page.close();
  });

  it('the owner reads a trait’s heritability, here and pooled', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}/traits`);
    await expect.poll(() => page.locator('tr.mat-mdc-row').count()).toBeGreaterThan(1);
    await expect.poll(() => chartText(page, 0)).toEqual(expect.arrayContaining(['Offspring', 'Regression line']));
    await expect.poll(() => chartText(page, 1)).toEqual(expect.arrayContaining(['Heritability h²']));
    expect(await page.locator('.verdict').innerText()).toMatch(/heritable/i);
    await page.getByRole('switch', { name: 'Pool every herd I may see' }).click();
    await page.waitForURL((u) => u.search.includes('scope=all'));
    await expect.poll(() => page.locator('.scope').innerText()).toContain('Pooled');
    const csv = await downloadFrom(page, 'Download CSV');
    expect(csv.text).toContain('Midparent–offspring regression');
    await panelScreenshots(page, 'panel-traits');
    await page.close();
  });

  it('the owner draws growth bands with chosen animals on top', async () => {
    const page = await pageFor('owner@example.test');
    await page.goto(`${baseUrl()}/r/${herdId}/growth`);
    await expect.poll(() => chartText(page), { timeout: 10_000 }).toEqual(expect.arrayContaining(['Age (weeks)', 'Median (50th)']));
    await page.getByLabel('Add an animal by ear ID').fill('BF1');
    await page.getByRole('option').first().click();
    await page.waitForURL((u) => u.search.includes('animals='));
    await expect.poll(() => page.locator('.weighings-table tr.mat-mdc-row').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(await page.locator('.weighings-table').innerText()).toMatch(/centile/);
    const csv = await downloadFrom(page, 'Download CSV');
    expect(csv.text).toContain('Ear ID,Weighed on,Age (days),Weight (grams),Weight,Centile');
    await panelScreenshots(page, 'panel-growth');
    await page.close();
  });

  it('answers each panel’s data quickly on the demo season', async () => {
    const page = await pageFor('owner@example.test');
    const timings = await page.evaluate(async (id) => {
      const out: Record<string, number> = {};
      for (const report of ['keepers', 'placement', 'heritability', 'growth']) {
        const url = `/api/rabbitries/${id}/analytics/${report}`;
        await fetch(url);
        const t0 = performance.now();
        await fetch(url, { cache: 'no-store' });
        out[report] = Math.round(performance.now() - t0);
      }
      return out;
    }, herdId);
    console.log('panel data (second ask, ms):', timings);
    for (const ms of Object.values(timings)) expect(ms).toBeLessThan(300);
    await page.close();
  });
});
