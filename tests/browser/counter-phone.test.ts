import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBrowser, signInAs, type BrowserSession } from './browser';

// A common phone's CSS viewport (390 × 844), the size a clerk on the floor or a technician in the bay holds.
const PHONE = { width: 390, height: 844 };

describe('the Counter on a phone', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
    await s.page.setViewportSize(PHONE);
    await signInAs(s, 'clerk@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
  });
  afterEach(async () => {
    await s.close();
  });

  it('shows results without sideways scrolling, and a tapped result opens its part in a sheet in view', async () => {
    const page = s.page;
    await page.getByLabel('Number, words or barcode').fill('SPF 52.135');
    const grid = page.getByRole('grid', { name: 'Search results' });
    // Seed: SPF 52.135 is claimed by two of our plugs (one claim is the deliberately wrong one).
    await grid.getByRole('row').nth(2).waitFor();
    await page.getByRole('status').filter({ hasText: 'found' }).waitFor();

    const widths = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, viewport: window.innerWidth }));
    expect(widths.viewport).toBe(PHONE.width);
    expect(widths.scroll).toBe(widths.viewport);
    await s.shot('counter-phone-results');

    // Tap the first result (a tap reaches the page as a click): the part opens as a dialog fixed
    // to the viewport, not far down the page.
    await grid.getByRole('row').nth(1).click();
    const sheet = page.getByRole('dialog');
    await sheet.getByRole('region', { name: /^Part / }).waitFor();
    // Let the sheet settle before measuring it.
    await page.waitForTimeout(300);
    const box = await sheet.boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y + box!.height).toBeLessThanOrEqual(PHONE.height + 0.5);
    expect(box!.x).toBeGreaterThanOrEqual(0);
    expect(box!.x + box!.width).toBeLessThanOrEqual(PHONE.width + 0.5);
    expect(await sheet.isVisible()).toBe(true);
    // Its content is readable stock and price, as on the desktop.
    expect(await sheet.textContent()).toMatch(/\d+ here/);
    await s.shot('counter-phone-sheet');

    // Still no sideways scroll with the sheet open.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBe(PHONE.width);
  });
});
