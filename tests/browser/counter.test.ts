import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBrowser, signInAs, type BrowserSession } from './browser';

/** The first result row whose part number cell reads `partNumber`. */
const resultRow = (s: BrowserSession, partNumber: string) =>
  s.page
    .getByRole('grid', { name: 'Search results' })
    .getByRole('row')
    .filter({ has: s.page.getByRole('gridcell', { name: partNumber, exact: true }) });

describe('journeys 1 and 2: the Counter', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
    await signInAs(s, 'clerk@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
  });
  afterEach(async () => {
    await s.close();
  });

  it('journey 1: a clerk picks 2012 Varrick Halvard VK18 and sees its coil and plug with on-hand, bin and price, and the ranked alternates', async () => {
    const page = s.page;
    await page.getByLabel('Year').selectOption('2012');
    await page.getByRole('option', { name: 'Varrick' }).waitFor({ state: 'attached' });
    await page.getByLabel('Make').selectOption('Varrick');
    await page.getByRole('option', { name: 'Halvard' }).waitFor({ state: 'attached' });
    await page.getByLabel('Model').selectOption('Halvard');
    await page.getByRole('option', { name: /\(VK18\)/ }).waitFor({ state: 'attached' });
    const engineLabel = await page.getByRole('option', { name: /\(VK18\)/ }).textContent();
    await page.getByLabel('Engine').selectOption({ label: engineLabel! });

    const coil = page.getByRole('region', { name: 'Fitted ignition coil' });
    const plug = page.getByRole('region', { name: 'Fitted spark plug' });
    await coil.getByRole('button', { name: 'QW-IC 3101' }).waitFor();
    await plug.getByRole('button', { name: 'QW-SP 1406' }).waitFor();
    // Seed: QW-IC 3101 has 14 on hand in bin A-01-1 and sells for $49.99; QW-SP 1406 has 64 in B-01-1 at $7.49.
    expect(await coil.textContent()).toMatch(/14 here · bin A-01-1/);
    expect(await coil.textContent()).toContain('$49.99');
    expect(await plug.textContent()).toMatch(/64 here · bin B-01-1/);
    expect(await plug.textContent()).toContain('$7.49');
    expect(await coil.textContent()).toMatch(/4 per engine/);

    // The alternates slot: either the ranking (each with a verdict word and a Compare link) or the note that it is not there yet.
    await coil.getByText(/Ranking alternates…/).waitFor({ state: 'detached' });
    const ranked = coil.getByRole('list', { name: 'coil alternates' });
    if ((await ranked.count()) > 0) {
      const first = ranked.getByRole('listitem').first();
      expect(await first.textContent()).toMatch(/^(go|review|no-go)/);
      const href = await first.getByRole('link', { name: 'Compare' }).getAttribute('href');
      expect(href).toMatch(/^\/compare\?original=[\w-]+&substitute=[\w-]+&engine=[\w-]+$/);
      await s.shot('counter-vehicle');
      // An alternate opens in the panel with its verdict against the fitted coil.
      const altNumber = (await first.getByRole('button').first().textContent())!;
      await first.getByRole('button', { name: altNumber }).click();
      const altPanel = page.getByRole('region', { name: `Part ${altNumber}` });
      await altPanel.getByText(/in place of QW-IC 3101 on VK18/).waitFor();
      await s.shot('counter-vehicle-alternate');
      // The part opens in a sheet over the page; Escape closes it and gives the page back.
      await page.keyboard.press('Escape');
      await altPanel.waitFor({ state: 'detached' });
      const before = await ranked.getByRole('listitem').count();
      await coil.getByLabel('show no-go too').check();
      await coil.getByText('no-go', { exact: true }).first().waitFor();
      expect(await ranked.getByRole('listitem').count()).toBeGreaterThan(before);
    } else {
      await coil.getByText('Ranked alternates are not available yet.').waitFor();
      await s.shot('counter-vehicle');
    }

    // The fitted coil opens in the part panel with its spec and units.
    await coil.getByRole('button', { name: 'QW-IC 3101' }).click();
    const panel = page.getByRole('region', { name: 'Part QW-IC 3101' });
    await panel.waitFor();
    expect(await panel.textContent()).toMatch(/Primary resistance\s*0\.5–0\.7\u00a0Ω/);
    expect(await panel.textContent()).not.toMatch(/Cost|Margin/);
  });

  it('journey 2: a foreign number finds our plugs through interchange, the wrong row marked; a superseded number leads to the current coil', async () => {
    const page = s.page;
    const box = page.getByLabel('Number, words or barcode');
    await expect(box.evaluate((el) => el === document.activeElement)).resolves.toBe(true);

    await box.fill('SPF 52.135');
    const right = resultRow(s, 'QW-SP 1435');
    const wrong = resultRow(s, 'QW-SP 1406');
    await right.waitFor();
    await wrong.waitFor();
    expect(await right.textContent()).toMatch(/via interchange SPF 52\.135/);
    expect(await wrong.textContent()).toMatch(/via interchange SPF 52\.135/);
    // Seed: SPF 52.135 is a 12.7 mm reach plug; the QW-SP 1406 row is the deliberately wrong one (19 mm reach).
    if ((await wrong.getByText('no-go', { exact: true }).count()) > 0) {
      expect(await wrong.textContent()).toMatch(/Reach/);
      expect(await right.getByText('no-go', { exact: true }).count()).toBe(0);
      // The wrong claim is listed below the right one, never as the first row a clerk takes.
      const firstRow = page.getByRole('grid', { name: 'Search results' }).getByRole('row').nth(1);
      expect(await firstRow.textContent()).toContain('QW-SP 1435');
    }

    // Keyboard: ↓ from the box into the results, ↓ to the second row, Enter opens it in the panel.
    await box.press('ArrowDown');
    const rows = page.getByRole('grid', { name: 'Search results' }).getByRole('row');
    await expect(rows.nth(1).getAttribute('aria-selected')).resolves.toBe('true');
    await page.keyboard.press('ArrowDown');
    await expect(rows.nth(2).getAttribute('aria-selected')).resolves.toBe('true');
    await expect(rows.nth(1).getAttribute('aria-selected')).resolves.toBe('false');
    // Read before opening: the modal sheet hides the page from the accessibility tree while open.
    const opened = (await rows.nth(2).getByRole('gridcell').first().textContent())!.trim();
    await page.keyboard.press('Enter');
    const panel = page.getByRole('region', { name: `Part ${opened}` });
    await panel.waitFor();
    const interchange = panel.getByRole('list', { name: 'Interchange numbers' });
    await interchange.getByText('SPF 52.135').waitFor();
    expect(await interchange.textContent()).toContain('(typed)');
    await s.shot('counter-interchange');
    // Escape closes the part sheet, and / brings the keyboard back to the search box.
    await page.keyboard.press('Escape');
    await panel.waitFor({ state: 'detached' });
    await page.keyboard.press('/');
    await expect(box.evaluate((el) => el === document.activeElement)).resolves.toBe(true);

    await box.fill('qw ic 3138');
    const current = resultRow(s, 'QW-IC 3140');
    await current.waitFor();
    expect(await current.textContent()).toMatch(/replaces QW[\s-]IC 3138/);
    // Enter with a single hit opens it: the scanner's path to the panel.
    await box.press('Enter');
    const chain = page.getByRole('region', { name: 'Part QW-IC 3140' });
    await chain.waitFor();
    await chain.getByRole('button', { name: 'QW-IC 3138' }).waitFor();
    expect(await chain.textContent()).toMatch(/Supersedes\s*QW-IC 3139, QW-IC 3138/);
    await s.shot('counter-supersession');

    // The chain is clickable: the old number opens and says what to sell instead.
    await chain.getByRole('button', { name: 'QW-IC 3138' }).click();
    const old = page.getByRole('region', { name: 'Part QW-IC 3138' });
    await old.waitFor();
    expect(await old.textContent()).toMatch(/Superseded: sell QW-IC 3140 instead/);
  });

  it('journey 3: a plug spec search by thread and reach lists only matching plugs, with facet counts', async () => {
    const page = s.page;
    await page.getByText('Plugs', { exact: true }).click();
    const thread = page.getByLabel('Thread (mm)');
    await thread.locator('option', { hasText: /^14 \(\d+\)$/ }).waitFor({ state: 'attached' });
    await thread.selectOption('14');
    await page.getByLabel('Reach (mm)').selectOption('12.7');
    const grid = page.getByRole('grid', { name: 'Search results' });
    await resultRow(s, 'QW-SP 1435').waitFor();
    // The table keeps the previous answer while the next is on its way: wait for it to settle.
    await expect.poll(() => grid.getByRole('row').count(), { timeout: 5000 }).toBe(2);
    expect(await page.getByRole('status').filter({ hasText: 'found' }).textContent()).toContain('1 found');
    await s.shot('counter-spec-search');
  });
});
