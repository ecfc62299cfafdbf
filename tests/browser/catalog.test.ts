import { randomUUID } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { gtinCheckDigit } from '../../shared/gtin';
import { openBrowser, signInAs, type BrowserSession } from './browser';

describe('the Catalog page', () => {
  let s: BrowserSession;
  beforeEach(async () => {
    s = await openBrowser();
  });
  afterEach(async () => {
    await s.close();
  });

  it('a buyer adds a brand with its heat table, a plug of it with a spec, an interchange row, and the Counter finds the plug by that number', async () => {
    // Invented brand, numbers and foreign maker; the tag keeps reruns on the same database apart.
    const tag = randomUUID().replace(/-/g, '').slice(0, 6).toUpperCase();
    const brand = `Velmora ${tag}`;
    const partNumber = `VM-${tag}-14`;
    const foreignNumber = `OSK ${tag} 77`;
    const gtinBody = `20${String(Number.parseInt(tag, 16) % 1e10).padStart(10, '0')}`;
    const gtin = `${gtinBody}${gtinCheckDigit(gtinBody)}`;
    const page = s.page;

    await signInAs(s, 'buyer@harborlane.test');
    await page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalog' }).click();
    await page.getByRole('heading', { name: 'Catalog', level: 1 }).waitFor();

    // Brands: a numbered run 3–9 from heat step 4, each next code colder, and one more code by hand.
    await page.getByRole('tab', { name: 'Brands' }).click();
    const brandForm = page.getByRole('form', { name: 'Add a brand' });
    await brandForm.getByLabel('Brand name').fill(brand);
    await brandForm.getByLabel('One of our lines').check();
    await brandForm.getByLabel('Which way the codes run').fill('Numbered 3–10; a higher number is a colder plug.');
    await brandForm.getByLabel('Run from code').fill('3');
    await brandForm.getByLabel('Run to code').fill('9');
    await brandForm.getByLabel('Heat step of the first code').selectOption('4');
    await brandForm.getByLabel('Each next code is').selectOption('colder');
    await brandForm.getByRole('button', { name: 'Fill' }).click();
    await brandForm.getByLabel('Heat code, row 7').waitFor();
    expect(await brandForm.getByLabel('Heat step, row 7').inputValue()).toBe('10');
    await brandForm.getByRole('button', { name: 'Add a heat code' }).click();
    // A new row starts one step colder than the last.
    expect(await brandForm.getByLabel('Heat step, row 8').inputValue()).toBe('11');
    await brandForm.getByLabel('Heat code, row 8').fill('10');
    const preview = brandForm.getByRole('list', { name: 'Heat codes on the heat-step scale' });
    expect(await preview.getByRole('listitem', { name: 'step 11: code 10' }).count()).toBe(1);
    expect(await brandForm.textContent()).toContain('By this table, a higher number is a colder plug.');
    await s.shot('catalog-brand-form');
    await brandForm.getByRole('button', { name: 'Add brand' }).click();
    await brandForm.getByRole('status').filter({ hasText: 'Brand added' }).waitFor();
    const listed = page.getByRole('list', { name: 'Brands' }).getByRole('listitem', { name: brand });
    await listed.waitFor();
    expect(await listed.getByRole('listitem', { name: 'step 4: code 3' }).count()).toBe(1);
    expect(await listed.textContent()).toContain('our line');
    await s.shot('catalog-brands');

    // New part: a plug of that brand with its spec; a GTIN with a wrong check digit is refused by its field first.
    await page.getByRole('tab', { name: 'New part' }).click();
    const partForm = page.getByRole('form', { name: 'Add a part' });
    await partForm.getByLabel('Brand').selectOption(brand);
    expect(await partForm.getByLabel('Spark plug').isChecked()).toBe(true);
    await partForm.getByLabel('Part number').fill(partNumber);
    await partForm.getByLabel('Description').fill('Iridium plug, M14 × 1.25, 19 mm reach, 16 mm hex');
    await partForm.getByLabel('GTIN').fill(`${gtinBody}${(gtinCheckDigit(gtinBody) + 1) % 10}`);
    // Leaving the field checks it: the message is beside it before anything is sent.
    await partForm.getByLabel('GTIN').blur();
    await partForm.getByText('The GTIN check digit is wrong').waitFor();
    expect(await partForm.getByLabel('GTIN').getAttribute('aria-invalid')).toBe('true');
    await s.shot('catalog-new-part-error');
    await partForm.getByLabel('GTIN').fill(gtin);
    await partForm.getByText('The GTIN check digit is wrong').waitFor({ state: 'detached' });
    await partForm.getByLabel('Add its plug spec now').check();
    await partForm.getByLabel('Thread (mm)', { exact: true }).fill('14');
    await partForm.getByLabel('Thread pitch (mm)').fill('1.25');
    await partForm.getByLabel('Reach (mm)').fill('19');
    await partForm.getByLabel('Seat').selectOption('flat');
    await partForm.getByLabel('Hex (mm)').fill('16');
    await partForm.getByLabel('Heat code').selectOption('6');
    await partForm.getByLabel('Gap (mm)').fill('0.8');
    await partForm.getByLabel('Resistor', { exact: true }).check();
    await partForm.getByLabel('Resistor value (kΩ)').fill('5');
    await partForm.getByLabel('Electrode').selectOption('iridium');
    await partForm.getByRole('button', { name: 'Add part' }).click();
    const added = partForm.getByRole('status').filter({ hasText: 'Part added' });
    await added.waitFor();
    // Code 6 is heat step 7 in the table above: the server mapped it through the brand's table.
    expect(await added.textContent()).toContain('heat code 6 = step 7');
    expect(await added.textContent()).toContain(`${brand} ${partNumber} (plug)`);
    await s.shot('catalog-new-part');

    // The new part opens in the editor: add another maker's number that leads to it.
    await partForm.getByRole('button', { name: `Open ${partNumber} to add interchange` }).click();
    const editor = page.getByRole('region', { name: `Editing ${partNumber}` });
    await editor.waitFor();
    expect(await editor.getByRole('form', { name: 'Plug spec' }).getByLabel('Reach (mm)').inputValue()).toBe('19');
    const row = editor.getByRole('form', { name: 'Add an interchange row' });
    await row.getByLabel('Foreign brand').fill('Oskarn Ignition');
    await row.getByLabel('Their number').fill(foreignNumber);
    await row.getByLabel('Source').fill('maker cross-reference');
    await row.getByLabel('How sure (%)').fill('90');
    await row.getByRole('button', { name: 'Add interchange row' }).click();
    await editor.getByRole('status').filter({ hasText: 'Interchange row added' }).waitFor();
    await editor.getByRole('table', { name: 'Interchange numbers' }).getByRole('cell', { name: foreignNumber }).waitFor();
    await s.shot('catalog-part-editor');

    // The Counter: the foreign number, typed as a customer reads it, finds the new plug.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Counter' }).click();
    await page.getByLabel('Number, words or barcode').fill(foreignNumber.toLowerCase().replace(/ /g, '-'));
    const hit = page
      .getByRole('grid', { name: 'Search results' })
      .getByRole('row')
      .filter({ has: page.getByRole('gridcell', { name: partNumber, exact: true }) });
    await hit.waitFor();
    expect(await hit.textContent()).toMatch(/via interchange/);
    await s.shot('catalog-counter-finds');
  });

  it('a buyer adds a coil without spec, is told it has no verdict, adds the spec, discontinues it and supersedes it; the Counter follows', async () => {
    const tag = randomUUID().replace(/-/g, '').slice(0, 6).toUpperCase();
    const brand = `Brenlow ${tag}`;
    const oldNumber = `BR-${tag}-1`;
    const newNumber = `BR-${tag}-2`;
    const page = s.page;
    await signInAs(s, 'buyer@harborlane.test');
    await page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
    await page.goto(`${s.baseUrl}/catalog?view=brands`);

    // A coil line needs no heat table.
    const brandForm = page.getByRole('form', { name: 'Add a brand' });
    await brandForm.getByLabel('Brand name').fill(brand);
    await brandForm.getByLabel('One of our lines').check();
    await brandForm.getByRole('button', { name: 'Add brand' }).click();
    await brandForm.getByRole('status').filter({ hasText: 'Brand added' }).waitFor();

    // Two coils of a series, without spec: brand and kind stay for the second.
    await page.getByRole('tab', { name: 'New part' }).click();
    const partForm = page.getByRole('form', { name: 'Add a part' });
    await partForm.getByLabel('Brand').selectOption(brand);
    // The radio itself is visually hidden; its label is what a person clicks.
    await partForm.locator('label', { hasText: 'Ignition coil' }).click();
    expect(await partForm.getByLabel('Ignition coil').isChecked()).toBe(true);
    for (const n of [oldNumber, newNumber]) {
      await partForm.getByLabel('Part number').fill(n);
      await partForm.getByLabel('Description').fill(`Coil-on-plug coil, 3-pin, ${n.endsWith('1') ? 'first' : 'second'} issue`);
      await partForm.getByRole('button', { name: 'Add part' }).click();
      await partForm.getByRole('status').filter({ hasText: n }).waitFor();
    }
    expect(await partForm.getByRole('status').textContent()).toContain('none (no verdict until one is added)');

    // Find the first by its number; Enter opens the first hit.
    await page.getByRole('tab', { name: 'Parts' }).click();
    const finder = page.getByRole('searchbox', { name: 'Number or words' });
    await finder.fill(oldNumber.toLowerCase());
    await page
      .getByRole('list', { name: 'Number or words: results' })
      .getByRole('button', { name: new RegExp(oldNumber) })
      .waitFor();
    await finder.press('Enter');
    const editor = page.getByRole('region', { name: `Editing ${oldNumber}` });
    await editor.waitFor();
    const spec = editor.getByRole('region', { name: 'Coil spec' });
    await spec.getByText('no spec — no verdict').waitFor();
    await s.shot('catalog-no-spec');

    await spec.getByRole('button', { name: 'Add a spec' }).click();
    const specForm = spec.getByRole('form', { name: 'Coil spec' });
    await specForm.getByLabel('Architecture').selectOption('coil-on-plug');
    await specForm.getByLabel('Driver').selectOption('integrated');
    await specForm.getByLabel('Outputs').fill('1');
    await specForm.getByLabel('Connector pins').fill('3');
    await specForm.getByLabel('Connector key').fill('B');
    await specForm.getByLabel('Primary resistance, min (Ω)').fill('0.8');
    await specForm.getByLabel('Primary resistance, max (Ω)').fill('0.6');
    await specForm.getByLabel('Primary inductance (mH)').fill('4.1');
    await specForm.getByLabel('Turns ratio (:1)').fill('85');
    await specForm.getByLabel('Peak primary current (A)').fill('8');
    await specForm.getByRole('button', { name: 'Save spec' }).click();
    await specForm.getByText("Primary resistance, min must not be above the window's max").waitFor();
    await s.shot('catalog-spec-error');
    await specForm.getByLabel('Primary resistance, max (Ω)').fill('0.95');
    await specForm.getByRole('button', { name: 'Save spec' }).click();
    const specSaved = specForm.getByRole('status').filter({ hasText: 'Spec saved' });
    await specSaved.waitFor();
    expect(await specSaved.textContent()).toMatch(/primary 0\.80–0\.95\u00a0Ω/);

    const details = editor.getByRole('form', { name: 'Part details' });
    await details.getByLabel('Status').selectOption('discontinued');
    await details.getByRole('button', { name: 'Save details' }).click();
    const detailsSaved = details.getByRole('status').filter({ hasText: 'Details saved' });
    await detailsSaved.waitFor();
    expect(await detailsSaved.textContent()).toMatch(/Status\s*active\s*→\s*discontinued/);

    const supersession = editor.getByRole('region', { name: 'Supersession' });
    await supersession.getByRole('searchbox', { name: 'Set superseded by' }).fill(newNumber);
    await supersession.getByRole('button', { name: new RegExp(newNumber) }).waitFor();
    await supersession.getByRole('searchbox', { name: 'Set superseded by' }).press('Enter');
    await supersession.getByRole('button', { name: 'Save supersession' }).click();
    const chainSaved = supersession.getByRole('status').filter({ hasText: 'Supersession saved' });
    await chainSaved.waitFor();
    expect(await chainSaved.textContent()).toMatch(new RegExp(`Superseded by\\s*none\\s*→\\s*${newNumber}`));
    await s.shot('catalog-part-edits');

    // On the replacement, the old number now leads back to itself, and the picker says so.
    await supersession.getByRole('button', { name: newNumber, exact: true }).click();
    const next = page.getByRole('region', { name: `Editing ${newNumber}` });
    await next.waitFor();
    const nextChain = next.getByRole('region', { name: 'Supersession' });
    await nextChain.getByRole('button', { name: oldNumber, exact: true }).waitFor();
    await nextChain.getByRole('searchbox', { name: 'Set superseded by' }).fill(oldNumber);
    await nextChain.getByText('Only this part itself matches').waitFor();

    // The Counter follows the supersession from the old number to the new part.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Counter' }).click();
    await page.getByLabel('Number, words or barcode').fill(oldNumber);
    const row = page
      .getByRole('grid', { name: 'Search results' })
      .getByRole('row')
      .filter({ has: page.getByRole('gridcell', { name: newNumber, exact: true }) });
    await row.waitFor();
    expect(await row.textContent()).toMatch(/replaces/);
  });
});
