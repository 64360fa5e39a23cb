import { readFile } from 'node:fs/promises';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, screenshot, signInAs } from './browser';

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

async function pageFor(email: string, viewport = DESKTOP): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signInAs(page, email);
  return page;
}

/** Text the panel's SVG chart drew (ECharts' SVG renderer puts legend and axis words in the page). */
const chartText = (page: Page, nth = 0) => page.locator('kl-panel-chart svg').nth(nth).locator('text').allTextContents();

/** The first rows of the keeper board, as ear IDs in rank order. */
const boardOrder = (page: Page) => page.locator('tr.main-row').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-ear-id')));

async function downloadOf(page: Page, button: string): Promise<{ name: string; text: string }> {
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: button, exact: true }).click()]);
  const path = await download.path();
  return { name: download.suggestedFilename(), text: path ? await readFile(path, 'utf8') : '' };
}

/**
 * Each panel at desktop and phone width, whole, for people to look at: the frame scrolls inside
 * the page, so the window is made as tall as the content for the picture.
 */
async function screenshots(page: Page, name: string): Promise<void> {
  for (const { width, height } of [DESKTOP, PHONE]) {
    await page.setViewportSize({ width, height });
    await page.waitForTimeout(300);
    const tall = await page.evaluate(() => Math.max(...[...document.querySelectorAll('body *')].map((e) => e.scrollHeight)));
    await page.setViewportSize({ width, height: Math.min(Math.max(height, tall + 80), 7000) });
    await page.waitForTimeout(500);
    await screenshot(page, `${name}-${width}`);
  }
  await page.setViewportSize(DESKTOP);
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

    const csv = await downloadOf(page, 'Download CSV');
    expect(csv.name).toMatch(/keeper-board.*\.csv$/);
    expect(csv.text).toContain('Rank,Ear ID,Name');
    expect(csv.text.split('\n').length).toBeGreaterThan(2);
    const png = await downloadOf(page, 'Save chart (PNG)');
    expect(png.name).toMatch(/\.png$/);
    await screenshots(page, 'panel-keepers');
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
    await page.getByRole('radio', { name: 'Dams' }).click();
    await page.waitForURL((u) => u.search.includes('parent=dam'));
    await expect.poll(() => page.locator('th').filter({ hasText: /^Dam$/ }).count()).toBe(1);
    const csv = await downloadOf(page, 'Download CSV');
    expect(csv.text).toContain('Dam ear ID');
    await screenshots(page, 'panel-sires-dams');
    const first = page.locator('tr.mat-mdc-row a.ear-id').first();
    const earId = await first.innerText();
    await first.click();
    await page.waitForURL(/\/animals\/\d+$/);
    await expect.poll(() => page.locator('main').innerText()).toContain(earId);
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
    const csv = await downloadOf(page, 'Download CSV');
    expect(csv.text).toContain('Midparent–offspring regression');
    await screenshots(page, 'panel-traits');
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
    const csv = await downloadOf(page, 'Download CSV');
    expect(csv.text).toContain('Ear ID,Weighed on,Age (days),Weight (grams),Weight,Centile');
    await screenshots(page, 'panel-growth');
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
