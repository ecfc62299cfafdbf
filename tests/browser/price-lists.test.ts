import { createHash, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { priceListHistorySchema } from '@shared/schemas/price-lists';
import { supplierSchema } from '@shared/schemas/suppliers';
import { openBrowser, signInAs, type BrowserSession } from './browser';

const CLEAN = path.resolve(import.meta.dirname, '../../seed/csv/supplier-a-clean.csv');
const BAD_ROWS = path.resolve(import.meta.dirname, '../../seed/csv/supplier-a-bad-rows.csv');
const CLEAN_SHA256 = createHash('sha256').update(readFileSync(CLEAN)).digest('hex');
// seed/data/suppliers.ts
const PELLWORTH = 'Pellworth Distribution';

/** GET from inside the page, with the buyer's session, as the app itself would. */
async function apiGet(s: BrowserSession, url: string): Promise<unknown> {
  return s.page.evaluate(async (u) => {
    const res = await fetch(u, { credentials: 'same-origin' });
    return res.json() as Promise<unknown>;
  }, url);
}

async function countOf(s: BrowserSession, label: string): Promise<string> {
  const tile = s.page
    .getByLabel('Preview counts')
    .locator('div')
    .filter({ has: s.page.locator('dt', { hasText: label }) });
  return (await tile.locator('dd').first().textContent()) ?? '';
}

describe('journey 6: price-list intake', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('a buyer drops the clean Pellworth file, confirms the mapping, previews, commits, and the Counter shows the new price', async () => {
    await signInAs(s, 'buyer@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    const nav = s.page.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: 'Price lists' }).click();
    await s.page.getByRole('heading', { name: 'Price lists' }).waitFor();

    // The browser suite shares one database: when an earlier run already committed this file for
    // Pellworth, the same file is refused (409), so the journey goes on with a new supplier.
    const { suppliers } = z.object({ suppliers: z.array(supplierSchema) }).parse(await apiGet(s, '/api/suppliers'));
    const pellworth = suppliers.find((x) => x.name === PELLWORTH);
    expect(pellworth).toBeDefined();
    const history = priceListHistorySchema.parse(await apiGet(s, `/api/price-lists?supplierId=${pellworth!.id}`));
    const alreadyCommitted = history.priceLists.some((l) => l.sha256 === CLEAN_SHA256 && l.status === 'committed');
    let supplierName = PELLWORTH;
    if (alreadyCommitted) {
      supplierName = `Pellworth test ${randomUUID().slice(0, 6)}`;
      await nav.getByRole('link', { name: 'Suppliers' }).click();
      const form = s.page.getByRole('form', { name: 'Add a supplier' });
      await form.getByLabel('Name').fill(supplierName);
      await form.getByLabel('Contact e-mail').fill('orders@example.test');
      await form.getByRole('button', { name: 'Add supplier' }).click();
      await s.page.getByRole('cell', { name: supplierName, exact: true }).waitFor();
      await nav.getByRole('link', { name: 'Price lists' }).click();
    }

    await s.page.getByLabel('Supplier', { exact: true }).selectOption({ label: supplierName });
    await s.page.getByLabel('Price-list file').setInputFiles(CLEAN);

    // The mapping, guessed from the headers: the buyer checks it and applies it.
    const columns = s.page.locator('section').filter({ has: s.page.getByRole('heading', { name: 'Columns' }) });
    await columns.getByRole('button', { name: 'Apply mapping' }).waitFor();
    expect(await columns.getByLabel('Part Number', { exact: true }).inputValue()).toBe('partNumber');
    expect(await columns.getByLabel('Brand', { exact: true }).inputValue()).toBe('brand');
    expect(await columns.getByLabel('Cost', { exact: true }).inputValue()).toBe('cost');
    expect(await columns.getByLabel('List', { exact: true }).inputValue()).toBe('list');
    expect(await columns.getByLabel('Supersedes', { exact: true }).inputValue()).toBe('supersedes');
    await s.shot('price-lists-mapping');
    await columns.getByRole('button', { name: 'Apply mapping' }).click();
    await s.page.getByRole('progressbar', { name: 'Reading the file again' }).waitFor({ state: 'detached' });
    await columns.getByRole('button', { name: 'Apply mapping' }).waitFor();

    // The preview, as seed/csv/README.md states it.
    expect(await countOf(s, 'Rows in file')).toBe('40');
    expect(await countOf(s, 'Rejected rows')).toBe('0');
    if (!alreadyCommitted) {
      expect(await countOf(s, 'New parts')).toBe('4');
      expect(await countOf(s, 'Price changes')).toBe('5');
      expect(await countOf(s, 'Unchanged')).toBe('31');
      const changes = s.page.getByRole('tabpanel');
      const row = changes.getByRole('row').filter({ hasText: 'NR/IR 2208' });
      await row.waitFor();
      expect(await row.textContent()).toMatch(/\$6\.40.*\$7\.60.*\+18\.8%.*\$14\.99.*\$16\.99/);
      expect(await row.getByText('Flagged').count()).toBe(1);
      expect(await changes.getByText('Flagged').count()).toBe(1);
    }
    await s.shot('price-lists-preview');

    await s.page.getByRole('tab', { name: /Supersessions/ }).click();
    await s.page.getByRole('tabpanel').getByRole('row').filter({ hasText: 'QW-IC 3161' }).waitFor();

    // Commit asks first, with the counts; nothing is written until the buyer confirms.
    await s.page.getByRole('button', { name: 'Commit 40 rows' }).click();
    const confirm = s.page.getByRole('dialog', { name: 'Commit supplier-a-clean.csv?' });
    const writes = confirm.getByLabel('What the commit writes');
    await writes.waitFor();
    expect(await writes.textContent()).toMatch(/New parts\d+Price changes\d+Unchanged\d+Supersessions\d+Rows refused \(not written\)0/);
    await s.shot('price-lists-commit-confirm');
    await confirm.getByRole('button', { name: 'Commit 40 rows' }).click();
    await s.page.getByRole('status').filter({ hasText: 'Committed supplier-a-clean.csv' }).waitFor();
    // The message says whether the Counter sells at this supplier's prices, by the sell-price rule.
    expect(await s.page.getByRole('status').filter({ hasText: 'Committed supplier-a-clean.csv' }).textContent()).toMatch(
      /Counter( now sells|'s prices did not change|’s prices did not change)/,
    );
    await s.shot('price-lists-committed');
    const historyRow = s.page.getByRole('row').filter({ hasText: 'supplier-a-clean.csv' }).filter({ hasText: 'committed' });
    expect(await historyRow.count()).toBe(1);
    // The file's hash is the server's business (refusing the same file twice), not a column for the buyer.
    expect(await historyRow.textContent()).not.toContain(CLEAN_SHA256.slice(0, 12));
    expect(await s.page.getByRole('columnheader', { name: /SHA/ }).count()).toBe(0);

    // The same file again for the same supplier is refused whole, before anything is staged.
    await s.page.getByRole('button', { name: 'Upload another file' }).click();
    await s.page.getByLabel('Price-list file').setInputFiles(CLEAN);
    await s.page
      .getByRole('alert')
      .filter({ hasText: /same file \(supplier-a-clean\.csv\) was committed for this supplier/ })
      .waitFor();
    await s.shot('price-lists-same-file-refused');

    // The file with bad rows: seven rejected with line, column and reason; the buyer discards it.
    await s.page.getByLabel('Price-list file').setInputFiles(BAD_ROWS);
    await s.page.getByRole('button', { name: 'Commit 9 rows' }).waitFor();
    expect(await countOf(s, 'Rows in file')).toBe('16');
    expect(await countOf(s, 'Rejected rows')).toBe('7');
    // Line 13's description began with "=": kept as text behind an apostrophe, and the preview says so.
    let defused = false;
    for (const tab of [/Unchanged/, /Price changes/]) {
      await s.page.getByRole('tab', { name: tab }).click();
      const row = s.page.getByRole('tabpanel').getByRole('row').filter({ hasText: 'QW-SP 1208' });
      defused = await row
        .getByText('Began like a spreadsheet formula')
        .waitFor({ timeout: 5000 })
        .then(() => true)
        .catch(() => false);
      if (defused) {
        expect(await row.textContent()).toContain("'=SUM(D2:D9)");
        await s.shot('price-lists-defused-formula');
        break;
      }
    }
    expect(defused).toBe(true);
    await s.page.getByRole('tab', { name: /Rejected rows/ }).click();
    const rejected = s.page.getByRole('tabpanel');
    const gtinRow = rejected.getByRole('row').filter({ has: s.page.getByRole('cell', { name: '8', exact: true }) });
    expect(await gtinRow.textContent()).toMatch(/GTIN.*check digit/);
    expect(
      await rejected
        .getByRole('row')
        .filter({ has: s.page.getByRole('cell', { name: '5', exact: true }) })
        .textContent(),
    ).toContain('Part Number');
    expect(await rejected.getByRole('link', { name: 'Download rejected rows (CSV)' }).getAttribute('href')).toMatch(/\/errors\.csv$/);
    await s.shot('price-lists-rejected-rows');
    await s.page.getByRole('button', { name: 'Discard' }).click();
    await s.page
      .getByRole('dialog', { name: /Discard supplier-a-bad-rows\.csv/ })
      .getByRole('button', { name: 'Discard the file' })
      .click();
    await s.page.getByRole('status').filter({ hasText: 'Nothing in the catalog changed' }).waitFor();

    // The Counter shows the committed price: NR/IR 2208, cost 7.60, list 16.99 from this supplier.
    await nav.getByRole('link', { name: 'Counter' }).click();
    const box = s.page.getByLabel('Number, words or barcode');
    await box.fill('NR/IR 2208');
    await box.press('Enter');
    const part = s.page.getByRole('region', { name: 'Part NR/IR 2208' });
    const priceRow = part.getByRole('row').filter({ hasText: supplierName });
    await priceRow.waitFor();
    expect(await priceRow.textContent()).toMatch(/\$16\.99.*\$7\.60/);
    await priceRow.scrollIntoViewIfNeeded();
    await s.shot('price-lists-counter-new-price');

    // The Suppliers page now dates the supplier's last price list (the part's sheet closes first).
    await s.page.keyboard.press('Escape');
    await nav.getByRole('link', { name: 'Suppliers' }).click();
    const supplierRow = s.page.getByRole('row').filter({ has: s.page.getByRole('cell', { name: supplierName, exact: true }) });
    await supplierRow.filter({ hasNotText: 'none yet' }).waitFor();
    await s.shot('price-lists-suppliers');
  });

  it('a pipe-delimited file is read with pipe preselected; another delimiter can be chosen, and Commit asks with the counts', async () => {
    await signInAs(s, 'buyer@harborlane.test');
    await s.page.getByRole('heading', { name: 'Counter' }).waitFor();
    const nav = s.page.getByRole('navigation', { name: 'Main' });
    const supplierName = `Pipe Supply ${randomUUID().slice(0, 6)}`;
    await nav.getByRole('link', { name: 'Suppliers' }).click();
    const form = s.page.getByRole('form', { name: 'Add a supplier' });
    await form.getByLabel('Name').fill(supplierName);
    await form.getByRole('button', { name: 'Add supplier' }).click();
    await s.page.getByRole('cell', { name: supplierName, exact: true }).waitFor();
    await nav.getByRole('link', { name: 'Price lists' }).click();
    await s.page.getByLabel('Supplier', { exact: true }).selectOption({ label: supplierName });

    const tag = randomUUID().slice(0, 5).toUpperCase();
    const lines = [
      'Part Number|Brand|Description|Cost|List|Core|Pack Qty|GTIN|Supersedes|Kind',
      `QW-IC P${tag}1|Quaywell|Coil, long boot|21.00|42.00|0.00|1|||coil`,
      `QW-IC P${tag}2|Quaywell|Coil, short boot|22.00|44.00|0.00|1|||coil`,
      'QW-SP 1406|Quaywell|Plug|3.30|7.59|0.00|4|||plug',
    ];
    await s.page
      .getByLabel('Price-list file')
      .setInputFiles({ name: 'pipe.txt', mimeType: 'text/plain', buffer: Buffer.from(lines.join('\n') + '\n') });
    const delimiter = s.page.getByLabel('Delimiter');
    await delimiter.waitFor();
    expect(await delimiter.inputValue()).toBe('|');
    expect(await countOf(s, 'Rows in file')).toBe('3');

    // The wrong delimiter reads one column: refused, once; choosing pipe again reads the file again.
    await delimiter.selectOption({ label: 'Comma ( , )' });
    await s.page.getByRole('alert').first().waitFor();
    await delimiter.selectOption({ label: 'Pipe ( | )' });
    await s.page.getByRole('button', { name: 'Commit 3 rows' }).waitFor();
    await s.shot('price-lists-pipe');

    await s.page.getByRole('button', { name: 'Commit 3 rows' }).click();
    const confirm = s.page.getByRole('dialog', { name: 'Commit pipe.txt?' });
    const writes = confirm.getByLabel('What the commit writes');
    expect(await writes.textContent()).toContain('New parts2');
    // Cancel writes nothing.
    await confirm.getByRole('button', { name: 'Cancel' }).click();
    await confirm.waitFor({ state: 'detached' });
    expect(await s.page.getByRole('status').filter({ hasText: 'Committed pipe.txt' }).count()).toBe(0);
    await s.page.getByRole('button', { name: 'Commit 3 rows' }).click();
    await s.page.getByRole('dialog', { name: 'Commit pipe.txt?' }).getByRole('button', { name: 'Commit 3 rows' }).click();
    await s.page.getByRole('status').filter({ hasText: 'Committed pipe.txt' }).waitFor();
  });
});
