import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, DESKTOP, launchBrowser, PHONE, screenshot, signInAs } from './browser';

const CLUB = 'Quillmere Valley Rabbit Breeders’ Association';
const HERD = 'Brackenfold Rabbitry';

let browser: Browser;
beforeAll(async () => { browser = await launchBrowser(); });
afterAll(async () => { await browser.close(); });

async function pageFor(email: string, viewport = DESKTOP): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signInAs(page, email);
  return page;
}

/** Names in the "Working in" switcher: the rabbitries and clubs this user belongs to. */
async function switcherOptions(page: Page): Promise<string[]> {
  await page.getByLabel('Working in').click();
  const options = await page.getByRole('option').allInnerTexts();
  await page.keyboard.press('Escape');
  return options.map((o) => o.replace(/\s+/g, ' ').trim());
}

describe('the app frame follows the roles', () => {
  it('refuses a wrong password with a message on the sign-in screen', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByLabel('E-mail').fill('owner@example.test');
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').innerText()).toMatch(/do not match/);
    await page.close();
  });

  const expected: Record<string, { sees: string[]; not: string[] }> = {
    'owner@example.test': { sees: [`${HERD} · owner`, `${CLUB} · member`], not: ['Lowmere'] },
    'partner@example.test': { sees: [`${HERD} · partner`], not: [CLUB] },
    'mentor@example.test': { sees: [`${HERD} · mentor`], not: [CLUB] },
    'officer@example.test': { sees: [`${CLUB} · officer`], not: [HERD] },
    'member@example.test': { sees: [`${CLUB} · member`], not: [HERD] },
    'other-club@example.test': { sees: ['Lowmere Coast Fanciers · officer'], not: [CLUB, HERD] },
  };
  for (const [email, { sees, not }] of Object.entries(expected)) {
    it(`${email} works in exactly what they belong to`, async () => {
      const page = await pageFor(email);
      const options = await switcherOptions(page);
      for (const s of sees) expect(options).toContain(s);
      for (const n of not) expect(options.join('|')).not.toContain(n);
      await page.close();
    });
  }

  it('a mentor reads the access list but cannot grant access or edit', async () => {
    const page = await pageFor('mentor@example.test');
    const me = (await page.evaluate(() => fetch('/api/session').then((r) => r.json()))) as { user: { rabbitries: { id: number }[] }; csrfToken: string };
    const herd = me.user.rabbitries[0];
    await page.goto(`${baseUrl()}/r/${herd.id}/access`);
    await expect.poll(() => page.getByRole('table').innerText()).toContain('owner@example.test');
    expect(await page.getByRole('button', { name: /give access|grant/i }).count()).toBe(0);
    const status = await page.evaluate(async ({ id, token }) => {
      const r = await fetch(`/api/rabbitries/${id}`, { method: 'PATCH', headers: { 'content-type': 'application/json', 'x-csrf-token': token }, body: JSON.stringify({ location: 'x' }) });
      return r.status;
    }, { id: herd.id, token: me.csrfToken });
    expect(status).toBe(403);
    await page.close();
  });

  it('a member of another club sees nothing of this one, even by address', async () => {
    const owner = await pageFor('owner@example.test');
    const session = (await owner.evaluate(() => fetch('/api/session').then((r) => r.json()))) as { user: { clubs: { id: number }[] } };
    const clubId = session.user.clubs[0].id;
    await owner.close();
    const page = await pageFor('other-club@example.test');
    expect(await page.locator('main').innerText()).not.toContain(CLUB);
    await page.goto(`${baseUrl()}/c/${clubId}/members`);
    await expect.poll(() => page.locator('main').innerText()).toMatch(/not found|no such|isn’t here|does not exist/i);
    expect(await page.locator('body').innerText()).not.toContain(CLUB);
    const api = await page.evaluate((id) => fetch(`/api/clubs/${id}`).then((r) => r.status), clubId);
    expect(api).toBe(404);
    await page.close();
  });

  it('shows the home overview at desktop and phone width', async () => {
    for (const [name, viewport] of [['desktop', DESKTOP], ['phone', PHONE]] as const) {
      const page = await pageFor('owner@example.test', viewport);
      await expect.poll(() => page.locator('main').innerText()).toContain(HERD);
      await screenshot(page, `home-${name}`);
      // The global stylesheet really applies (a CSP-blocked onload handler once left it print-only).
      expect(await page.evaluate("getComputedStyle(document.querySelector('.kl-page')).paddingTop")).not.toBe('0px');
      const overflow = Number(await page.evaluate('document.documentElement.scrollWidth - window.innerWidth'));
      expect(overflow).toBeLessThanOrEqual(0);
      await page.close();
    }
  });
});
