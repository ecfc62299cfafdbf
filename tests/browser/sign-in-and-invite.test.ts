import { randomUUID } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBrowser, signInAs, type BrowserSession } from './browser';

describe('journey 7: sign-in and team', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('a clerk signs in and sees the Counter page, with no admin pages in the navigation', async () => {
    await signInAs(s, 'clerk@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    expect(s.page.url()).toContain('/counter');
    const nav = s.page.getByRole('navigation', { name: 'Main' });
    await expect(nav.getByRole('link', { name: 'Counter' }).isVisible()).resolves.toBe(true);
    expect(await nav.getByRole('link', { name: 'Team' }).count()).toBe(0);
    await s.shot('clerk-counter');
  });

  it('a wrong password shows the error and stays on sign-in', async () => {
    await signInAs(s, 'clerk@harborlane.test', 'wrong-password');
    await s.page.getByRole('alert').waitFor();
    expect(await s.page.getByRole('alert').textContent()).toMatch(/Wrong e-mail or password/);
    expect(s.page.url()).toContain('/sign-in');
  });

  it('an admin invites a user, opens the Outbox, follows the link, sets a password, and the user signs in', async () => {
    const email = `invitee-${randomUUID().slice(0, 6)}@example.test`;
    await signInAs(s, 'admin@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await s.page.getByRole('link', { name: 'Team' }).click();
    const form = s.page.getByRole('form', { name: 'Invite a user' });
    await form.getByLabel('Name').fill('Robin Invitee');
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Role').selectOption('buyer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await s.page.getByRole('status').filter({ hasText: 'Invitation sent' }).waitFor();
    await s.page.getByRole('cell', { name: email }).waitFor();
    await s.shot('admin-team');

    // A role change signs the person out, so it asks first; Cancel leaves the role as it was.
    const role = s.page.getByLabel('Role of Robin Invitee');
    await role.selectOption('clerk');
    const dialog = s.page.getByRole('dialog', { name: 'Make Robin Invitee a clerk?' });
    await dialog.waitFor();
    await s.shot('admin-team-confirm');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(await role.inputValue()).toBe('buyer');
    await role.selectOption('clerk');
    await dialog.getByRole('button', { name: 'Make clerk' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect(await role.inputValue()).toBe('clerk');

    // On a phone the team table scrolls inside its own region; the page stays the phone's width.
    await s.page.setViewportSize({ width: 390, height: 844 });
    await s.page.getByRole('region', { name: 'People' }).waitFor();
    expect(await s.page.evaluate(() => document.documentElement.scrollWidth)).toBe(390);
    await s.shot('admin-team-phone');
    await s.page.setViewportSize({ width: 1366, height: 900 });

    // Beside the Outbox, the Jobs page: follow-up work that did not go through at once, if any.
    await s.page.getByRole('link', { name: 'Jobs' }).click();
    await s.page.getByRole('heading', { name: 'Jobs' }).waitFor();
    await s.page
      .getByText(/Nothing is waiting or failed|Retry|retrying at/)
      .first()
      .waitFor();
    await s.shot('admin-jobs');

    await s.page.getByRole('link', { name: 'Outbox' }).click();
    const message = s.page.getByRole('button', { name: new RegExp(`to ${email.replace('.', '\\.')}`) });
    await message.waitFor({ timeout: 15000 });
    if ((await message.getAttribute('aria-expanded')) !== 'true') await message.click();
    await s.shot('admin-outbox');
    const link = s.page.getByRole('link', { name: /accept-invite\?token=/ }).first();
    const href = await link.getAttribute('href');
    expect(href).toContain(s.baseUrl);

    // The invitee opens the link in their own browser.
    await s.page.getByRole('button', { name: 'Sign out' }).click();
    await s.page.getByRole('heading', { name: /Sign in/ }).waitFor();
    await s.page.goto(href!);
    await s.page.getByText(`Welcome, Robin Invitee (${email})`).waitFor();
    // The shared password rule speaks before anything is sent.
    await s.page.getByLabel('New password').fill('password123');
    await s.page.getByText('New password is a common password or too close to one').waitFor();
    expect(await s.page.getByRole('button', { name: 'Set password' }).isDisabled()).toBe(true);
    await s.page.getByLabel('New password').fill('robin-password-1');
    await s.page.getByLabel('Repeat password').fill('robin-password-1');
    await s.page.getByRole('button', { name: 'Set password' }).click();
    await s.page.getByRole('link', { name: 'Go to sign-in' }).click();
    await signInAs(s, email, 'robin-password-1');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    // Made a clerk before the first sign-in: no buyer's pages in the navigation.
    expect(await s.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Price lists' }).count()).toBe(0);
    expect(await s.page.getByText('Robin Invitee').count()).toBeGreaterThan(0);
  });
});
