import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const SCREENSHOT_DIR = path.resolve(import.meta.dirname, 'screenshots');

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  baseUrl: string;
  shot(name: string): Promise<void>;
  close(): Promise<void>;
}

/** Debian's Chromium with a fresh profile, as a person's browser would start. */
export async function openBrowser(): Promise<BrowserSession> {
  const profile = mkdtempSync(path.join(tmpdir(), 'arcwise-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: FLAGS,
    headless: true,
    viewport: { width: 1366, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return {
    context,
    page,
    baseUrl: inject('baseUrl'),
    async shot(name) {
      await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signInAs(s: BrowserSession, email: string, password = 'arcwise-demo'): Promise<void> {
  await s.page.goto(`${s.baseUrl}/sign-in`);
  await s.page.getByLabel('E-mail').fill(email);
  await s.page.getByLabel('Password').fill(password);
  await s.page.getByRole('button', { name: 'Sign in' }).click();
}

/** From any signed-in page: the Bench test with a catalog coil chosen; its readings group. */
export async function benchWithCoil(s: BrowserSession, partNumber: string) {
  await s.page.getByRole('link', { name: 'Bench test' }).click();
  await s.page.getByRole('heading', { name: 'Bench test' }).waitFor();
  await s.page.getByLabel('Find the coil').fill(partNumber);
  await s.page
    .getByRole('button', { name: new RegExp(partNumber) })
    .first()
    .click();
  await s.page.getByTestId('bench-coil').filter({ hasText: partNumber }).waitFor();
  return s.page.getByRole('group', { name: 'Bench readings' });
}
