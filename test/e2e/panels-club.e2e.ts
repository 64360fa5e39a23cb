import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, chartWords, DESKTOP, downloadFrom, launchBrowser, panelScreenshots, screenshot, signedInPage } from './browser';

// The pairing planner, the club season and the line comparison, each opened by the role it is for.
let browser: Browser;
beforeAll(async () => { browser = await launchBrowser(); });
afterAll(async () => { await browser.close(); });

interface Me { user: { rabbitries: { id: number; name: string }[]; clubs: { id: number; name: string }[] } }

async function pageFor(email: string, viewport = DESKTOP): Promise<{ page: Page; me: Me }> {
  const page = await signedInPage(browser, email, viewport);
  const me = (await page.evaluate(() => fetch('/api/session').then((r) => r.json()))) as Me;
  return { page, me };
}

/** Words the SVG charts under `selector` write, so a test can check their legends and axis labels. */
const chartText = (page: Page, selector: string) => chartWords(page.locator(selector)).then((t) => t.join(' | '));

describe('club and mentor panels', () => {
  it('the owner plans a pairing: the heatmap draws, a cell names its common ancestors, the mates save as CSV', async () => {
    const { page, me } = await pageFor('owner@example.test');
    const herd = me.user.rabbitries[0]!;
    await page.goto(`${baseUrl()}/r/${herd.id}/pairing`);
    await expect.poll(() => page.locator('main h1').innerText()).toBe('Pairing planner');
    await expect.poll(() => page.locator('kl-cautions-note').innerText()).toMatch(/smaller litters/);
    await screenshot(page, 'pairing-empty-1280');

    await page.getByLabel('Plan for (ear ID or name)').fill('BF100');
    await page.getByRole('option', { name: /BF100/ }).first().click();
    await page.waitForURL(/animal=\d+/);
    await page.locator('.heatmap svg').waitFor();
    await expect.poll(() => chartText(page, '.heatmap')).toMatch(/Bucks.*Does|Does.*Bucks/);
    const words = await chartText(page, '.heatmap');
    expect(words).toContain('BF100 Lark');
    expect(words).toMatch(/25 % and over|12\.5–25 %/);
    expect(await page.locator('table.mates tr.mat-mdc-row').count()).toBeGreaterThan(0);
    await expect.poll(() => page.locator('.summary').innerText()).toMatch(/Planning for BF100 Lark/);

    // A cell of the grid (the legend's swatches are the paths moved into place by a transform).
    const ramp = ['#f5f0df', '#d3deb4', '#8dbb9b', '#3d8a8c', '#1b4a6b'];
    await page.locator(ramp.map((c) => `.heatmap svg path[fill="${c}"]:not([transform])`).join(', ')).first().click({ force: true }); // its number lies over it; the chart takes the click either way
    await expect.poll(() => page.locator('.pair h3').innerText()).toMatch(/ × /);
    await expect.poll(() => page.locator('.pair').innerText()).toMatch(/share of the inbreeding|unrelated|related/i);

    const csv = await downloadFrom(page, 'Download mates CSV');
    expect(csv.name).toMatch(/^bf100-mates-.*\.csv$/);
    expect(csv.text.split(/\r?\n/)[0]).toContain('Mate ear ID');
    expect(csv.text.split(/\r?\n/).length).toBeGreaterThan(2);

    await page.locator('section[aria-labelledby="grid-title"] details summary').click();
    await page.locator('.grid-table button.cell').last().click();
    await expect.poll(() => page.locator('.pair h3').innerText()).toMatch(/ × /);
    await panelScreenshots(page, 'panel-pairing');
    await page.close();
  });

  it('the officer opens the season: standings rows, points lines with a legend, the formula editor', async () => {
    const { page, me } = await pageFor('officer@example.test');
    const club = me.user.clubs[0]!;
    await page.goto(`${baseUrl()}/c/${club.id}`);
    await page.getByRole('link', { name: 'Season', exact: true }).click();
    await page.waitForURL(new RegExp(`/c/${club.id}/season`));
    await expect.poll(() => page.locator('table.standings tr.mat-mdc-row').count(), { timeout: 15_000 }).toBeGreaterThan(3);
    const first = await page.locator('table.standings tr.mat-mdc-row').first().innerText();
    expect(first).toMatch(/^1\s/);

    const points = '[aria-labelledby="points-title"] kl-panel-chart';
    await page.locator(`${points} svg`).waitFor();
    await expect.poll(() => chartText(page, points)).toContain('Points so far');
    const legend = await chartText(page, points);
    expect(legend).toContain(first.split('\t')[1]!.replace(/\s*member$/, '').trim());
    await expect.poll(() => page.locator('kl-panel-chart').count()).toBe(2);

    await page.getByRole('button', { name: 'Season dates and points formula' }).click();
    await expect.poll(() => page.locator('kl-season-settings h3').innerText()).toBe('Season and points formula');
    await page.getByRole('radio', { name: '× animals in class' }).click();
    await page.locator('input[name="place-1"]').fill('');
    await expect.poll(() => page.locator('kl-season-settings mat-error').first().innerText()).toBe('Give the points for 1st place');
    expect(await page.getByRole('button', { name: 'Save season settings' }).isDisabled()).toBe(true);
    await page.getByRole('button', { name: 'Undo changes' }).click();
    await screenshot(page, 'season-officer-1280');

    const csv = await downloadFrom(page, 'Download standings CSV');
    expect(csv.name).toMatch(/standings.*\.csv$/);
    expect(csv.text.split(/\r?\n/)[0]).toContain('Exhibitor');

    await page.getByRole('button', { name: 'Close the season settings' }).click();
    await panelScreenshots(page, 'panel-season');
    await page.close();
  });

  it('a member reads the season without the formula editor', async () => {
    const { page, me } = await pageFor('member@example.test');
    const club = me.user.clubs[0]!;
    await page.goto(`${baseUrl()}/c/${club.id}/season`);
    await expect.poll(() => page.locator('table.standings tr.mat-mdc-row').count(), { timeout: 15_000 }).toBeGreaterThan(3);
    await page.locator('kl-panel-chart svg').first().waitFor();
    expect(await page.getByRole('button', { name: 'Season dates and points formula' }).count()).toBe(0);
    expect(await page.locator('kl-season-settings').count()).toBe(0);
    await expect.poll(() => page.locator('.kl-lede').innerText()).toMatch(/× animals in the class/);
    await page.close();
  });

  it('the mentor compares lines: box plots draw with n under each, the figures save as CSV', async () => {
    const { page, me } = await pageFor('mentor@example.test');
    const herd = me.user.rabbitries[0]!;
    await page.goto(`${baseUrl()}/r/${herd.id}`);
    await page.getByRole('link', { name: 'Line comparison' }).click();
    await page.waitForURL(/\/lines/);
    await expect.poll(() => page.locator('kl-panel-chart svg').count(), { timeout: 15_000 }).toBeGreaterThan(3);
    const words = await chartText(page, 'kl-panel-chart');
    expect(words).toMatch(/n = \d+/);
    expect(words).toContain('Ember');
    expect(words).toContain('percentile');
    expect(await page.locator('table.figures tr.mat-mdc-row').count()).toBeGreaterThan(4);
    await panelScreenshots(page, 'panel-lines');

    const csv = await downloadFrom(page, 'Download CSV');
    expect(csv.text.split(/\r?\n/)[0]).toContain('Lower quartile');

    await page.getByLabel('Measure').click();
    await page.getByRole('option', { name: /Litter size weaned/ }).click();
    await page.waitForURL(/measure=litter_weaned/);
    await expect.poll(() => page.locator('kl-panel-chart').count()).toBe(1);
    await expect.poll(() => chartText(page, 'kl-panel-chart')).toContain('kits');
    await panelScreenshots(page, 'panel-lines-one');
    await page.close();
  });

  it('a member of a club without results reads what to do next', async () => {
    const { page, me } = await pageFor('other-club@example.test');
    await page.goto(`${baseUrl()}/c/${me.user.clubs[0]!.id}/season`);
    await expect.poll(() => page.locator('main').innerText(), { timeout: 15_000 }).toMatch(/No results imported for this season yet|Standings/);
    await panelScreenshots(page, 'panel-season-other-club');
    await page.close();
  });
});
