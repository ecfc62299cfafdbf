import AxeBuilder from '@axe-core/playwright';
import type { Page } from 'playwright-core';

// Issue 10 "must show": no violation of impact serious or critical (axe-core's rules: WCAG 2.x A/AA and best practice).
export async function seriousViolations(page: Page, where: string): Promise<string[]> {
  const result = await new AxeBuilder({ page }).analyze();
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${where}: ${v.id} (${v.impact}) ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}
