import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { navFor } from '@/app/nav';
import type { Role } from '@shared/roles';
import { DEMO_USERS } from '../../seed/users';
import { seriousViolations } from './axe';
import { openBrowser, signInAs, type BrowserSession } from './browser';

describe('accessibility (axe)', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('sign-in has no serious or critical violation', async () => {
    await s.page.goto(`${s.baseUrl}/sign-in`);
    await s.page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(await seriousViolations(s.page, '/sign-in')).toEqual([]);
  });

  const roles: Role[] = ['clerk', 'technician', 'buyer', 'admin'];
  for (const role of roles) {
    it(`every page a ${role} can reach has no serious or critical violation`, async () => {
      const user = DEMO_USERS.find((u) => u.role === role)!;
      await signInAs(s, user.email);
      await s.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
      const found: string[] = [];
      for (const item of navFor(role)) {
        await s.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: item.label, exact: true }).click();
        await s.page.waitForURL(`**${item.to}`);
        await s.page.getByRole('heading', { level: 1 }).first().waitFor();
        // Lists and tables load after the heading: wait until the page has no request in flight.
        await s.page.waitForLoadState('networkidle');
        found.push(...(await seriousViolations(s.page, `${role} ${item.to}`)));
      }
      expect(found).toEqual([]);
      // An admin reaches thirteen pages, each analysed in full: minutes on a busy machine.
    }, 240_000);
  }
});
