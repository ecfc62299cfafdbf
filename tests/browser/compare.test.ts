import { randomUUID } from 'node:crypto';
import { afterEach, describe, expect, it } from 'vitest';
import { CAUTIONS } from '@shared/schemas/compat';
import { benchWithCoil, openBrowser, signInAs, type BrowserSession } from './browser';

/**
 * Journey 4: Compare, fit report, e-mail, share link. The demo case: the 2012 Varrick Halvard
 * Plus has engine VK18, fitted with QW-IC 3101 (seed/data/fitments.ts); QW-IC 3104 is the
 * economy coil that seed/data/alternates.ts lists as `review` against it, decided by its lower
 * stored energy at cranking.
 */
const TECH = 'tech@docksidegarage.test';
const ADMIN = 'admin@harborlane.test';

async function chooseVehicle(s: BrowserSession, year: string, make: string, model: string, engineCode: string) {
  const vehicle = s.page.getByRole('group', { name: 'Vehicle' });
  await vehicle.getByLabel('Year', { exact: true }).selectOption(year);
  await vehicle.getByLabel('Make', { exact: true }).selectOption(make);
  await vehicle.getByLabel('Model', { exact: true }).selectOption(model);
  const engine = vehicle.getByLabel('Engine', { exact: true });
  const option = engine.locator('option', { hasText: `(${engineCode})` });
  await option.waitFor({ state: 'attached' });
  await engine.selectOption((await option.getAttribute('value'))!);
}

describe('journey 4: compare, save a fit report, e-mail and share it', () => {
  const sessions: BrowserSession[] = [];
  const open = async () => {
    const s = await openBrowser();
    sessions.push(s);
    return s;
  };
  afterEach(async () => {
    await Promise.all(sessions.splice(0).map((s) => s.close()));
  });

  it('a technician compares a demo coil, saves and e-mails the report; the Outbox has its link; the link opens read-only', async () => {
    const tech = await open();
    await signInAs(tech, TECH);
    await tech.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await tech.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare' }).click();
    await tech.page.getByRole('heading', { name: 'Compare' }).waitFor();

    await chooseVehicle(tech, '2012', 'Varrick', 'Halvard', 'VK18');
    await tech.page.getByTestId('engine-code').filter({ hasText: 'VK18' }).waitFor();
    // The engine's fitted coil is the original by default.
    const original = tech.page.getByTestId('original-part');
    await original.filter({ hasText: 'QW-IC 3101' }).waitFor();
    expect(await original.textContent()).toContain('fitted');

    const substitute = tech.page.getByRole('region', { name: 'Substitute' });
    await substitute.getByLabel('Find the substitute coil').fill('QW-IC 3104');
    await substitute
      .getByRole('button', { name: /QW-IC 3104/ })
      .first()
      .click();
    await tech.page.getByTestId('substitute-part').filter({ hasText: 'QW-IC 3104' }).waitFor();

    // The verdict: review, as seed/data/alternates.ts expects, with the deciding row marked review.
    const overall = tech.page.getByTestId('overall-verdict');
    await overall.waitFor();
    expect((await overall.textContent())?.trim()).toBe('review');
    expect(await overall.locator('svg[data-verdict-icon="review"]').count()).toBe(1);
    const table = tech.page.getByRole('table', { name: /Checks of/ });
    const energyRow = table.locator('tr[data-check="energy-cranking"]');
    expect(await energyRow.textContent()).toMatch(/review/);
    expect(await energyRow.textContent()).toMatch(/mJ/);
    expect(await table.locator('tbody tr').count()).toBe(9);
    expect(await table.locator('tbody tr svg[data-verdict-icon]').count()).toBe(9);

    // Both charts render as SVG with their lines drawn.
    const currentChart = tech.page.getByRole('figure', { name: 'Primary current over the dwell window' });
    const voltageChart = tech.page.getByRole('figure', { name: /Required and available secondary voltage/ });
    await currentChart.locator('svg.recharts-surface[role="application"]').waitFor();
    await voltageChart.locator('svg.recharts-surface[role="application"]').waitFor();
    const drawn = async (chart: typeof currentChart) =>
      (await chart.locator('path.recharts-line-curve').evaluateAll((paths) => paths.map((p) => p.getAttribute('d') ?? ''))).filter(
        (d) => d.length > 20,
      ).length;
    expect(await drawn(currentChart)).toBe(4);
    expect(await drawn(voltageChart)).toBe(4);
    expect(await voltageChart.locator('path.recharts-area-area').count()).toBeGreaterThanOrEqual(1);
    expect(await currentChart.textContent()).toMatch(/primary current \(A\)/);
    expect(await currentChart.textContent()).toMatch(/\(ms\)/);

    const cautions = tech.page.getByRole('complementary', { name: 'Cautions' });
    for (const c of CAUTIONS) expect(await cautions.textContent()).toContain(c);
    await tech.shot('compare-coil-review');

    // Save as a fit report and land on it.
    const title = `Halvard VK18 coil ${randomUUID().slice(0, 4)}`;
    const save = tech.page.getByRole('form', { name: 'Save as fit report' });
    await save.getByLabel('Fit report title').fill(title);
    await save.getByRole('button', { name: 'Save as fit report' }).click();
    await tech.page.waitForURL(/\/fit-reports\/[0-9a-f-]{36}$/);
    await tech.page.getByRole('heading', { name: title }).waitFor();
    expect((await tech.page.getByTestId('overall-verdict').textContent())?.trim()).toBe('review');
    await tech.page
      .getByRole('figure', { name: 'Primary current over the dwell window' })
      .locator('svg.recharts-surface[role="application"]')
      .waitFor();
    const shareUrl = await tech.page.getByLabel(/Share link/).inputValue();
    expect(shareUrl).toMatch(/\/shared\/fit-reports\/[A-Za-z0-9_-]{20,}$/);

    // E-mail it to a customer.
    const to = `customer-${randomUUID().slice(0, 6)}@example.test`;
    const email = tech.page.getByRole('form', { name: 'E-mail the fit report' });
    await email.getByLabel('E-mail to').fill(to);
    await email.getByRole('button', { name: 'Send' }).click();
    await email
      .getByRole('status')
      .filter({ hasText: `Sent to ${to}` })
      .waitFor();
    await tech.shot('fit-report');
    await tech.page.emulateMedia({ media: 'print' });
    await tech.shot('fit-report-print');
    expect(await tech.page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await tech.page.getByRole('complementary', { name: 'Cautions' }).isVisible()).toBe(true);
    await tech.page.emulateMedia({ media: 'screen' });

    // The list shows it.
    await tech.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Fit reports' }).click();
    const listed = tech.page.getByRole('row', { name: new RegExp(title) });
    await listed.waitFor();
    expect(await listed.textContent()).toMatch(/review/);
    expect(await listed.textContent()).toMatch(/Toni Tech/);
    await tech.shot('fit-reports-list');

    // An admin, in a browser of their own, finds the message in the Outbox with the report's link.
    const admin = await open();
    await signInAs(admin, ADMIN);
    await admin.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await admin.page.getByRole('link', { name: 'Outbox' }).click();
    const message = admin.page.getByRole('button', { name: new RegExp(`to ${to.replace(/\./g, '\\.')}`) });
    await message.waitFor({ timeout: 15000 });
    if ((await message.getAttribute('aria-expanded')) !== 'true') await message.click();
    const link = admin.page.getByRole('link', { name: shareUrl });
    await link.waitFor();
    await admin.shot('compare-outbox');
    const href = await link.getAttribute('href');
    expect(href).toBe(shareUrl);

    // Anyone with the link, signed in or not, sees the read-only report with the cautions.
    const visitor = await open();
    await visitor.page.goto(href!);
    await visitor.page.getByRole('heading', { name: title }).waitFor();
    expect((await visitor.page.getByTestId('overall-verdict').textContent())?.trim()).toBe('review');
    const shared = visitor.page.getByRole('complementary', { name: 'Cautions' });
    for (const c of CAUTIONS) expect(await shared.textContent()).toContain(c);
    await visitor.page
      .getByRole('figure', { name: /Required and available secondary voltage/ })
      .locator('svg.recharts-surface[role="application"]')
      .waitFor();
    expect(await visitor.page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);
    expect(await visitor.page.getByRole('form', { name: 'E-mail the fit report' }).count()).toBe(0);
    expect(visitor.page.url()).toContain('/shared/fit-reports/');
    await visitor.shot('shared-fit-report');
  });

  it('the Counter’s link opens Compare on a plug pair, inferring the kind from the part', async () => {
    const tech = await open();
    await signInAs(tech, TECH);
    await tech.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await tech.page.getByRole('link', { name: 'Compare' }).click();
    await tech.page.locator('label', { hasText: 'Spark plug' }).click();
    expect(await tech.page.getByRole('radio', { name: 'Spark plug' }).isChecked()).toBe(true);
    await chooseVehicle(tech, '2012', 'Varrick', 'Halvard', 'VK18');
    await tech.page.getByTestId('original-part').filter({ hasText: 'QW-SP 1406' }).waitFor();
    const substitute = tech.page.getByRole('region', { name: 'Substitute' });
    await substitute.getByLabel('Find the substitute plug').fill('QW-SP 1404');
    await substitute
      .getByRole('button', { name: /QW-SP 1404/ })
      .first()
      .click();
    const overall = tech.page.getByTestId('overall-verdict');
    await overall.waitFor();
    // Two heat steps hotter (seed/data/alternates.ts): no-go, decided by the heat row.
    expect((await overall.textContent())?.trim()).toBe('no-go');
    expect(await tech.page.locator('tr[data-check="heat"]').textContent()).toMatch(/no-go/);
    expect(await tech.page.getByRole('figure', { name: 'Primary current over the dwell window' }).count()).toBe(0);
    await tech.page
      .getByRole('figure', { name: /Required and available secondary voltage/ })
      .locator('svg.recharts-surface[role="application"]')
      .waitFor();
    await tech.shot('compare-plug-no-go');

    // The same comparison by address, as the Counter links to it, without a kind.
    const url = new URL(tech.page.url());
    url.searchParams.delete('kind');
    await tech.page.goto(url.toString());
    await tech.page.getByTestId('overall-verdict').filter({ hasText: 'no-go' }).waitFor();
    expect(await tech.page.getByRole('radio', { name: 'Spark plug' }).isChecked()).toBe(true);
  });

  it('an external-driver coil pack is held to the engine’s driver limit, drawn on the current chart', async () => {
    // VK30 (2010 Varrick Pennon Touring) switches its QW-CP 5201 pack with an 8 A driver; the
    // low-resistance QW-CP 5205 draws more than that: no-go on driver current (seed/data/alternates.ts).
    const clerk = await open();
    await signInAs(clerk, 'clerk@harborlane.test');
    await clerk.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await clerk.page.getByRole('link', { name: 'Compare' }).click();
    await chooseVehicle(clerk, '2010', 'Varrick', 'Pennon', 'VK30');
    await clerk.page.getByTestId('original-part').filter({ hasText: 'QW-CP 5201' }).waitFor();
    const substitute = clerk.page.getByRole('region', { name: 'Substitute' });
    await substitute.getByLabel('Find the substitute coil').fill('QW-CP 5205');
    await substitute
      .getByRole('button', { name: /QW-CP 5205/ })
      .first()
      .click();
    await clerk.page.getByTestId('overall-verdict').filter({ hasText: 'no-go' }).waitFor();
    expect(await clerk.page.locator('tr[data-check="driver-current"]').textContent()).toMatch(/no-go/);
    const chart = clerk.page.getByRole('figure', { name: 'Primary current over the dwell window' });
    await chart.getByText(/driver limit 8\s?A/).waitFor();
    expect(await chart.locator('.recharts-reference-line line').count()).toBe(3);
    await clerk.shot('compare-driver-limit');
  });

  it('a technician types a measured coil as the substitute and bench-tests a coil', async () => {
    const tech = await open();
    await signInAs(tech, TECH);
    await tech.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await tech.page.getByRole('link', { name: 'Compare' }).click();
    await chooseVehicle(tech, '2012', 'Varrick', 'Halvard', 'VK18');
    await tech.page.getByTestId('original-part').filter({ hasText: 'QW-IC 3101' }).waitFor();
    const substitute = tech.page.getByRole('region', { name: 'Substitute' });
    await tech.page.getByRole('group', { name: 'Substitute: how to choose' }).getByRole('button', { name: 'Type a spec' }).click();
    const form = substitute.getByRole('form', { name: 'Substitute spec' });
    // Starts from the original's spec; a window the wrong way round is refused by its field.
    expect(await form.getByLabel('Primary resistance, min (Ω)').inputValue()).toBe('0.5');
    await form.getByLabel('Primary resistance, min (Ω)').fill('0.9');
    await form.getByRole('button', { name: 'Use this spec' }).click();
    await form.getByText("Primary resistance, min must not be above the window's max").waitFor();
    await form.getByLabel('Primary resistance, min (Ω)').fill('0.55');
    await form.getByLabel('Primary inductance (mH)').fill('3.3');
    await form.getByRole('button', { name: 'Use this spec' }).click();
    const overall = tech.page.getByTestId('overall-verdict');
    await overall.waitFor();
    expect(await tech.page.getByText('typed-in coil spec').count()).toBeGreaterThan(0);
    await tech.shot('compare-typed-spec');

    // An edit that is not a figure: the verdict and its charts go, the field says why, nothing is sent.
    let compares = 0;
    tech.page.on('request', (r) => {
      if (new URL(r.url()).pathname.startsWith('/api/compat/')) compares += 1;
    });
    await form.getByLabel('Primary inductance (mH)').fill('abc');
    await overall.waitFor({ state: 'detached' });
    await tech.page.getByTestId('compare-out-of-date').waitFor();
    expect(await tech.page.getByRole('figure', { name: /secondary voltage/ }).count()).toBe(0);
    await form.getByRole('button', { name: 'Use this spec' }).click();
    await form.getByText('Primary inductance must be a number').waitFor();
    expect(await tech.page.getByTestId('overall-verdict').count()).toBe(0);
    expect(compares).toBe(0);
    // Put back as used: the verdict is current again.
    await form.getByLabel('Primary inductance (mH)').fill('3.3');
    await overall.waitFor();
    await tech.page.setViewportSize({ width: 390, height: 844 });
    await tech.shot('compare-typed-spec-phone');
    // On a phone the verdict, tables and charts fit the screen; tables scroll inside their regions.
    expect(await tech.page.evaluate(() => document.documentElement.scrollWidth)).toBe(390);
    await tech.page.setViewportSize({ width: 1440, height: 900 });

    const readings = await benchWithCoil(tech, 'QW-IC 3101');
    // 0.72 Ω on a winding at 60 °C is 0.622 Ω at 20 °C (α = 0.00393 /K): inside 0.5–0.7 Ω.
    await readings.getByLabel('Primary resistance (Ω)').fill('0.72');
    await readings.getByLabel('Temperature (°C)').fill('60');
    await readings.getByRole('button', { name: 'Check readings' }).click();
    const verdict = tech.page.getByTestId('bench-verdict');
    await verdict.waitFor();
    expect((await verdict.textContent())?.trim()).toBe('in spec');
    expect(await tech.page.getByRole('region', { name: 'Bench test result' }).textContent()).toContain('0.622');
    expect(await tech.page.getByRole('complementary', { name: 'Cautions' }).textContent()).toContain(CAUTIONS[0]);
    await tech.shot('bench-in-spec');
  });

  it('an admin changes a threshold on Settings; a bad value is refused by its field', async () => {
    const admin = await open();
    await signInAs(admin, ADMIN);
    await admin.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await admin.page.getByRole('link', { name: 'Settings' }).click();
    const form = admin.page.getByRole('form', { name: 'Settings' });
    await form.getByLabel(/^Charging voltage/).waitFor();
    await form.getByLabel(/^Energy at cranking, review from/).fill('0.95');
    await form.getByRole('button', { name: 'Save settings' }).click();
    await form.getByText('“Energy at cranking, review from” must not exceed “Energy at cranking, go from”').waitFor();
    await admin.shot('settings-error');
    await form.getByLabel(/^Energy at cranking, review from/).fill('0.75');
    await form.getByLabel(/^Flag price moves above/).fill('20');
    await form.getByRole('button', { name: 'Save settings' }).click();
    await form.getByRole('status').filter({ hasText: 'Saved' }).waitFor();
    await admin.page.reload();
    expect(
      await admin.page
        .getByRole('form', { name: 'Settings' })
        .getByLabel(/^Flag price moves above/)
        .inputValue(),
    ).toBe('20');
    // Put it back so other journeys see the defaults.
    await admin.page.getByRole('button', { name: 'Fill in the defaults' }).click();
    await admin.page.getByRole('button', { name: 'Save settings' }).click();
    await admin.page.getByRole('status').filter({ hasText: 'Saved' }).waitFor();
    await admin.shot('settings');
  });
});
