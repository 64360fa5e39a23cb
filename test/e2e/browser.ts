import { mkdirSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { chromium, type Browser, type Locator, type Page } from 'playwright-core';
import { inject } from 'vitest';

/** Debian's Chromium, headless, with the flags this closed network needs. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync'],
  });
}

export const baseUrl = () => inject('baseUrl');
export const DESKTOP = { width: 1280, height: 860 };
export const PHONE = { width: 360, height: 740 };

/** Signs in through the real sign-in screen and waits for the home overview. */
export async function signInAs(page: Page, email: string): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('keeperline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

/** Screenshots land in screenshots/ (ignored by git) for people to look at. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync('screenshots', { recursive: true });
  await page.screenshot({ path: `screenshots/${name}.png`, fullPage: true });
}

/** A new page of its own, signed in as `email` (downloads accepted, light or dark scheme as asked). */
export async function signedInPage(browser: Browser, email: string, viewport = DESKTOP, colorScheme: 'light' | 'dark' = 'light'): Promise<Page> {
  const page = await browser.newPage({ viewport, acceptDownloads: true, colorScheme });
  await signInAs(page, email);
  return page;
}

/** Words an SVG chart wrote (ECharts' SVG renderer puts legend and axis words in the page as text). */
export const chartWords = (chart: Locator): Promise<string[]> => chart.locator('svg text').allTextContents();

/** Clicks the button (or link) that saves a file and returns the file's name and text. */
export async function downloadFrom(page: Page, name: string): Promise<{ name: string; text: string }> {
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name, exact: true }).first().click()]);
  const path = await file.path();
  return { name: file.suggestedFilename(), text: path ? await readFile(path, 'utf8') : '' };
}

/**
 * A panel at desktop and phone width, whole, for people to look at: the frame scrolls inside the
 * page, so the window is made as tall as the content for the picture.
 */
export async function panelScreenshots(page: Page, name: string): Promise<void> {
  for (const { width, height } of [DESKTOP, PHONE]) {
    await page.setViewportSize({ width, height });
    await page.waitForTimeout(300);
    const tall = await page.locator('body *').evaluateAll((all) => Math.max(...all.map((e) => e.scrollHeight)));
    await page.setViewportSize({ width, height: Math.min(Math.max(height, tall + 80), 9000) });
    await page.waitForTimeout(500);
    await screenshot(page, `${name}-${width}`);
  }
  await page.setViewportSize(DESKTOP);
}

/** The fill colours a chart's words were drawn in. */
export const chartTextFills = (chart: Locator): Promise<(string | null)[]> =>
  chart.locator('svg text').evaluateAll((texts) => texts.map((t) => t.getAttribute('fill')));
