import { randomUUID } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe';
import { openBrowser, signInAs, type BrowserSession } from './browser';

const PHONE = { width: 390, height: 844 };
const DESK = { width: 1440, height: 900 };

describe('the admin’s Stores page', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
    await signInAs(s, 'admin@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
  });
  afterEach(async () => {
    await s.close();
  });

  it('lists the chain’s stores and adds and edits one in a dialog form', async () => {
    const page = s.page;
    await page.setViewportSize(DESK);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Stores', exact: true }).click();
    await page.getByRole('heading', { name: 'Stores', level: 1 }).waitFor();
    const table = page.getByRole('table', { name: 'Stores' });
    // Seed (seed/data/locations.ts): the invented chain's first store.
    const quayside = table.getByRole('row').filter({ hasText: 'Harbor Lane Quayside' });
    await quayside.waitFor();
    expect(await quayside.textContent()).toContain('14 Wharf Row, Port Ellery');
    expect(await quayside.textContent()).toContain('555-0140');
    expect(await quayside.textContent()).toContain('Mon–Fri 7:30–18:00, Sat 8:00–14:00');

    await page.getByRole('button', { name: 'Add a store' }).click();
    const add = page.getByRole('dialog', { name: 'Add a store' });
    await add.getByRole('button', { name: 'Add the store' }).click();
    await add.getByText('Name must not be blank').waitFor();
    expect(await seriousViolations(page, 'the add-a-store dialog')).toEqual([]);
    const name = `Harbor Lane Saltings ${randomUUID().slice(0, 4)}`;
    await add.getByLabel('Name').fill(name);
    await add.getByLabel('Address').fill('3 Sluice Walk, Port Ellery');
    await add.getByLabel('Phone').fill('555-0199');
    await add.getByLabel('Opening hours').fill('Mon–Sat 9:00–17:00');
    await s.shot('stores-add');
    await add.getByRole('button', { name: 'Add the store' }).click();
    await add.waitFor({ state: 'detached' });
    const added = table.getByRole('row').filter({ hasText: name });
    await added.getByText('555-0199').waitFor();

    await added.getByRole('button', { name: `Edit ${name}` }).click();
    const edit = page.getByRole('dialog', { name: `Edit ${name}` });
    expect(await edit.getByLabel('Address').inputValue()).toBe('3 Sluice Walk, Port Ellery');
    await edit.getByLabel('Phone').fill('555-0198');
    await edit.getByRole('button', { name: 'Save the store' }).click();
    await edit.waitFor({ state: 'detached' });
    await added.getByText('555-0198').waitFor();
    expect(await added.textContent()).not.toContain('555-0199');
    await s.shot('stores-desk');

    // On a phone the page keeps to the screen; the table scrolls inside its own region.
    await page.setViewportSize(PHONE);
    await page.getByRole('button', { name: 'Add a store' }).click();
    await page.getByRole('dialog', { name: 'Add a store' }).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBe(PHONE.width);
    await s.shot('stores-phone-add');
    await page.keyboard.press('Escape');
    await page.getByRole('dialog').waitFor({ state: 'detached' });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBe(PHONE.width);
    await s.shot('stores-phone');
  }, 120_000);

  it('shows each person’s home store on the Team page, and the invite form offers the stores', async () => {
    const page = s.page;
    await page.setViewportSize(DESK);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team', exact: true }).click();
    await page.getByRole('heading', { name: 'Team', level: 1 }).waitFor();
    // Seed (seed/users.ts): Casey works at Quayside, Dana at Eastgate; the technician has none.
    const casey = page.getByLabel('Home store of Casey Clerk');
    await casey.waitFor();
    expect(await casey.evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent)).toBe('Harbor Lane Quayside');
    expect(await page.getByLabel('Home store of Dana Clerk').evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent)).toBe(
      'Harbor Lane Eastgate',
    );
    expect(await page.getByLabel('Home store of Toni Tech').count()).toBe(0);
    const invite = page.getByRole('form', { name: 'Invite a user' });
    // The admin's own store is chosen first.
    expect(await invite.getByLabel('Home store').evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent)).toBe(
      'Harbor Lane Quayside',
    );
    await s.shot('team-desk');
    await page.setViewportSize(PHONE);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBe(PHONE.width);
    await s.shot('team-phone');
  }, 120_000);
});
