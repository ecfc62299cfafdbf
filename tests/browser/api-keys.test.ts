import { randomUUID } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBrowser, signInAs, type BrowserSession } from './browser';

describe('API keys page', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('an admin creates a key, sees and copies it once, the key works without a cookie, and revoking asks first', async () => {
    const name = `Web shop ${randomUUID().slice(0, 6)}`;
    await s.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: s.baseUrl });
    await signInAs(s, 'admin@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await s.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'API keys' }).click();
    const form = s.page.getByRole('form', { name: 'Create an API key' });
    await form.getByLabel('Name').fill(name);
    await form.getByLabel('Scope').selectOption('read');
    await form.getByRole('button', { name: 'Create key' }).click();
    const shown = s.page.getByRole('status', { name: 'New API key' });
    await shown.waitFor();
    const key = (await shown.getByLabel('API key').textContent()) ?? '';
    expect(key.length).toBeGreaterThan(40);
    await shown.getByRole('button', { name: 'Copy' }).click();
    await shown.getByRole('button', { name: 'Copied' }).waitFor();
    expect(await s.page.evaluate(() => navigator.clipboard.readText())).toBe(key);
    const row = s.page.getByRole('row').filter({ hasText: name });
    await row.waitFor();
    expect(await row.textContent()).not.toContain(key);
    await s.shot('admin-api-keys');

    // The other system calls with the key alone.
    const search = await fetch(`${s.baseUrl}/api/search?q=coil`, { headers: { Authorization: `Bearer ${key}` } });
    expect(search.status).toBe(200);

    // Reloaded, the page no longer has the key to show.
    await s.page.reload();
    await row.waitFor();
    expect(await s.page.getByText(key).count()).toBe(0);

    await row.getByRole('button', { name: `Revoke ${name}` }).click();
    await s.page
      .getByRole('dialog', { name: `Revoke “${name}” for good?` })
      .getByRole('button', { name: 'Revoke' })
      .click();
    await row.getByText(/^revoked/).waitFor();
    const after = await fetch(`${s.baseUrl}/api/search?q=coil`, { headers: { Authorization: `Bearer ${key}` } });
    expect(after.status).toBe(401);
  });
});
