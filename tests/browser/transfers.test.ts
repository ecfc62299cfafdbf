import type { Page } from 'playwright-core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { seriousViolations } from './axe';
import { openBrowser, signInAs, type BrowserSession } from './browser';

// A common phone's CSS viewport (390 × 844) and a wide desk screen.
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1440, height: 900 };

// Seed (seed/data/stock.ts): the fitted plug of the OD57 engine, QW-SP 1455T, is out at Quayside
// and 3 are on hand at Eastgate. Casey works at Quayside, Dana at Eastgate (seed/users.ts).
const PART = 'QW-SP 1455T';
const EASTGATE = 'Harbor Lane Eastgate';

async function openPart(page: Page, partNumber: string) {
  await page.getByLabel('Number, words or barcode').fill(partNumber);
  await page.getByLabel('Number, words or barcode').press('Enter');
  const panel = page.getByRole('region', { name: `Part ${partNumber}` });
  await panel.waitFor();
  return panel;
}

/** Casey asks Eastgate for `quantity` of the part from the part panel and follows the link to Transfers. */
async function askFromPartPanel(page: Page, quantity: number) {
  await page.getByRole('link', { name: 'Counter' }).click();
  const panel = await openPart(page, PART);
  await panel.getByRole('button', { name: `Ask ${EASTGATE}…` }).click();
  const dialog = page.getByRole('dialog', { name: `Ask ${EASTGATE} for ${PART}` });
  await dialog.getByLabel('Quantity').fill(String(quantity));
  await dialog.getByRole('button', { name: `Ask for ${quantity} from ${EASTGATE}` }).click();
  await dialog
    .getByRole('status')
    .filter({ hasText: `Asked ${EASTGATE} for ${quantity}` })
    .waitFor();
  await dialog.getByRole('link', { name: 'Follow it on Transfers' }).click();
  await page.getByRole('heading', { name: 'Transfers', level: 1 }).waitFor();
}

const newestRow = (page: Page) => page.getByRole('table', { name: 'Transfers' }).getByRole('row').filter({ hasText: PART }).first();

const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

// Two browsers and several pages each on a shared machine: each journey gets two minutes.
describe('transfers between stores: asked from the part panel, answered on the Transfers page', () => {
  let casey: BrowserSession;
  let dana: BrowserSession;
  beforeEach(async () => {
    casey = await openBrowser();
    await casey.page.setViewportSize(DESK);
    await signInAs(casey, 'clerk@harborlane.test');
    await casey.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
    dana = await openBrowser();
    await dana.page.setViewportSize(PHONE);
    await signInAs(dana, 'clerk.eastgate@harborlane.test');
    await dana.page.getByRole('heading', { name: 'Counter', level: 1 }).waitFor();
  });
  afterEach(async () => {
    await casey.close();
    await dana.close();
  });

  it('a Quayside clerk asks Eastgate for a part, held to what Eastgate has; Eastgate refuses with a reason, then picks a second request', async () => {
    const page = casey.page;
    const panel = await openPart(page, PART);
    expect(await panel.textContent()).toMatch(new RegExp(`0 here · bin B-06-2 · 3 at ${EASTGATE}`));
    await panel.getByRole('button', { name: `Ask ${EASTGATE}…` }).click();
    const dialog = page.getByRole('dialog', { name: `Ask ${EASTGATE} for ${PART}` });
    // More than Eastgate has is refused before anything is sent (1 up to their on hand).
    await dialog.getByLabel('Quantity').fill('4');
    await dialog.getByRole('button', { name: `Ask ${EASTGATE}` }).click();
    await dialog.getByText('Quantity must be at most 3').waitFor();
    expect(await seriousViolations(page, 'the ask-another-store dialog')).toEqual([]);
    await casey.shot('transfers-ask-too-many');
    await dialog.getByLabel('Quantity').fill('2');
    await dialog.getByRole('button', { name: `Ask for 2 from ${EASTGATE}` }).click();
    await dialog
      .getByRole('status')
      .filter({ hasText: `Asked ${EASTGATE} for 2 × ` })
      .waitFor();
    await casey.shot('transfers-asked');
    await dialog.getByRole('link', { name: 'Follow it on Transfers' }).click();
    await page.getByRole('heading', { name: 'Transfers', level: 1 }).waitFor();
    // The asking store may only cancel while it waits.
    const caseyRow = newestRow(page);
    await caseyRow.getByRole('button', { name: 'Cancel request' }).waitFor();
    expect(await caseyRow.getByRole('button', { name: 'Mark picked' }).count()).toBe(0);
    expect(await caseyRow.textContent()).toContain('Requested');

    // Eastgate, on a phone: its next steps are Mark picked and Refuse.
    const other = dana.page;
    await other.getByRole('link', { name: 'Transfers' }).click();
    await other.getByRole('heading', { name: 'Transfers', level: 1 }).waitFor();
    const danaRow = newestRow(other);
    await danaRow.getByRole('button', { name: 'Mark picked' }).waitFor();
    expect(await pageWidth(other)).toBe(PHONE.width);
    await dana.shot('transfers-phone');
    await danaRow.getByRole('button', { name: 'Refuse…' }).click();
    const refuse = other.getByRole('dialog', { name: new RegExp(`^Refuse 2 × .*${PART}\\?$`) });
    // The reason is required.
    await refuse.getByRole('button', { name: 'Refuse the request' }).click();
    await refuse.getByText('Reason must not be blank').waitFor();
    expect(await seriousViolations(other, 'the refuse dialog')).toEqual([]);
    await refuse.getByLabel('Reason').fill('The last ones are set aside for a fleet customer.');
    await dana.shot('transfers-refuse-phone');
    await refuse.getByRole('button', { name: 'Refuse the request' }).click();
    await refuse.waitFor({ state: 'detached' });
    await danaRow.getByText('The last ones are set aside for a fleet customer.').waitFor();
    expect(await danaRow.textContent()).toContain('Refused');
    expect(await danaRow.getByRole('button').count()).toBe(0);

    // Casey sees the refusal and its reason.
    await page.reload();
    await newestRow(page).getByText('The last ones are set aside for a fleet customer.').waitFor();

    // A second request, moved along: Eastgate marks it picked, and then may mark it sent.
    await askFromPartPanel(page, 1);
    await other.reload();
    const second = newestRow(other);
    expect(await second.textContent()).toContain('Requested');
    await second.getByRole('button', { name: 'Mark picked' }).click();
    await second.getByRole('button', { name: 'Mark sent' }).waitFor();
    expect(await second.textContent()).toContain('Picked');
  }, 120_000);

  it('when the asking store cancels first, the other store’s step is refused in plain words and the list shows the cancel', async () => {
    await askFromPartPanel(casey.page, 1);
    const other = dana.page;
    await other.getByRole('link', { name: 'Transfers' }).click();
    const danaRow = newestRow(other);
    await danaRow.getByRole('button', { name: 'Mark picked' }).waitFor();

    // Casey cancels while Dana's page still offers Mark picked.
    const caseyRow = newestRow(casey.page);
    await caseyRow.getByRole('button', { name: 'Cancel request' }).click();
    await caseyRow.getByText('Cancelled').waitFor();

    await danaRow.getByRole('button', { name: 'Mark picked' }).click();
    await other
      .getByRole('alert')
      .filter({ hasText: 'Someone else acted on this transfer first, so “Mark picked” was not done.' })
      .waitFor();
    await danaRow.getByText('Cancelled').waitFor();
    expect(await danaRow.getByRole('button', { name: 'Mark picked' }).count()).toBe(0);
    await dana.shot('transfers-conflict-phone');
  }, 120_000);
});
