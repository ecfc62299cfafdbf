import { afterEach, describe, expect, it } from 'vitest';
import { benchWithCoil, openBrowser, signInAs, type BrowserSession } from './browser';

/**
 * Bench test: a result on screen always belongs to the inputs shown. The demo coil QW-IC 3101
 * has a 0.5–0.7 Ω primary window at 20 °C (seed/data).
 */
const TECH = 'tech@docksidegarage.test';

describe('bench test', () => {
  const sessions: BrowserSession[] = [];
  afterEach(async () => {
    await Promise.all(sessions.splice(0).map((s) => s.close()));
  });

  it('a valid check shows a verdict; a bad reading clears it, says why in words and sends nothing', async () => {
    const tech = await openBrowser();
    sessions.push(tech);
    await signInAs(tech, TECH);
    await tech.page.getByRole('heading', { name: 'Counter' }).waitFor();
    let checks = 0;
    tech.page.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === '/api/bench/coil') checks += 1;
    });

    const readings = await benchWithCoil(tech, 'QW-IC 3101');
    const primary = readings.getByLabel('Primary resistance (Ω)');
    const temperature = readings.getByLabel('Temperature (°C)');
    const check = readings.getByRole('button', { name: 'Check readings' });

    // 0.60 Ω at 20 °C: inside 0.5–0.7 Ω, and said once (no corrected twin at the reference temperature).
    await primary.fill('0.60');
    await check.click();
    const verdict = tech.page.getByTestId('bench-verdict');
    await verdict.waitFor();
    expect((await verdict.textContent())?.trim()).toBe('in spec');
    const result = tech.page.getByRole('region', { name: 'Bench test result' });
    expect(await result.textContent()).toContain('reads 0.600 Ω at 20 °C, inside');
    expect(await result.textContent()).not.toContain('(0.600 Ω at 20 °C)');
    expect(checks).toBe(1);
    await tech.shot('bench-valid');

    // "abc" is not a reading: the verdict goes, the field says so with its label, nothing is sent.
    await primary.fill('abc');
    await verdict.waitFor({ state: 'detached' });
    await tech.page.getByTestId('bench-out-of-date').waitFor();
    await check.click();
    await readings.getByText('Primary resistance must be a number').waitFor();
    expect(await primary.getAttribute('aria-invalid')).toBe('true');
    expect(await tech.page.getByTestId('bench-verdict').count()).toBe(0);

    // −300 °C is below what the meter's reading can be corrected from: the limit in its unit.
    await temperature.fill('-300');
    await check.click();
    await readings.getByText(/^Temperature must be at least −40\s°C$/).waitFor();
    expect(await tech.page.getByTestId('bench-verdict').count()).toBe(0);
    await tech.shot('bench-invalid');
    expect(checks).toBe(1);

    // An overload reading (1e9 Ω, a meter's "OL") is an open winding, not one out of its window.
    await primary.fill('1e9');
    await temperature.fill('20');
    await check.click();
    await verdict.waitFor();
    expect((await verdict.textContent())?.trim()).toBe('open');
    expect(await result.textContent()).toContain('open circuit');
    expect(checks).toBe(2);

    // On a phone (390 × 844) the page with its result is no wider than the screen.
    await tech.page.setViewportSize({ width: 390, height: 844 });
    await tech.shot('bench-phone');
    expect(await tech.page.evaluate(() => document.documentElement.scrollWidth)).toBe(390);
  });

  it('a typed-in window whose ends are the wrong way round is refused in words', async () => {
    const tech = await openBrowser();
    sessions.push(tech);
    await signInAs(tech, TECH);
    await tech.page.getByRole('heading', { name: 'Counter' }).waitFor();
    await tech.page.getByRole('link', { name: 'Bench test' }).click();
    await tech.page.getByRole('button', { name: 'Type the window' }).click();
    const form = tech.page.getByRole('form', { name: 'Bench test' });
    await form.getByLabel('Primary resistance, min (Ω)').fill('0.9');
    await form.getByLabel('Primary resistance, max (Ω)').fill('0.5');
    await form.getByLabel('Primary resistance (Ω)').fill('0.6');
    await form.getByRole('button', { name: 'Check readings' }).click();
    await form.getByText("Primary resistance, min must not be above the window's max").waitFor();
  });
});
