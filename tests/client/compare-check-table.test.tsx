import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { VERDICTS, type CheckRow } from '@shared/schemas/compat';
import { CheckTable } from '@/features/compat/components/check-table';
import { formatFigure } from '@shared/format';

const rows: CheckRow[] = [
  {
    id: 'connector',
    verdict: 'go',
    original: '3 pins with key A',
    substitute: '3 pins with key A',
    unit: '',
    reason: 'Both connectors have 3 pins with key A.',
  },
  {
    id: 'energy-cranking',
    verdict: 'review',
    original: 95.625,
    substitute: 80.352,
    unit: 'mJ',
    reason: 'The substitute stores less energy at cranking.',
  },
  {
    id: 'primary-window',
    verdict: 'no-go',
    original: '1.30–1.70',
    substitute: '0.40–0.60',
    unit: 'Ω',
    reason: 'The windows do not overlap.',
  },
  {
    id: 'secondary-window',
    verdict: 'go',
    original: null,
    substitute: null,
    unit: 'kΩ',
    reason: 'Neither coil states a secondary window.',
  },
];

describe('the check table', () => {
  afterEach(cleanup);

  it('shows every verdict as its word and its own icon, never colour alone', () => {
    render(<CheckTable checks={rows} originalLabel="Quaywell QW-IC 3101" substituteLabel="Quaywell QW-IC 3104" />);
    const table = screen.getByRole('table');
    const shapes = new Map<string, string>();
    for (const verdict of VERDICTS) {
      const row = table.querySelector(`tr[data-check="${rows.find((r) => r.verdict === verdict)!.id}"]`) as HTMLElement;
      expect(within(row).getByText(verdict, { exact: true })).toBeTruthy();
      const icon = row.querySelector(`svg[data-verdict-icon="${verdict}"]`);
      expect(icon, `${verdict} has an icon`).not.toBeNull();
      expect(icon!.getAttribute('aria-hidden')).toBe('true');
      shapes.set(verdict, icon!.innerHTML);
    }
    // Three different drawings: the verdicts differ in shape, not only in colour.
    expect(new Set(shapes.values()).size).toBe(3);
  });

  it('names each row in the trade’s words and shows both figures with units and the reason', () => {
    render(<CheckTable checks={rows} />);
    const energy = screen.getByRole('row', { name: /Stored energy at cranking/ });
    // The figures carry a no-break space, which the matcher normalises to a plain one.
    expect(within(energy).getByText('95.6 mJ')).toBeTruthy();
    expect(within(energy).getByText('80.4 mJ')).toBeTruthy();
    expect(within(energy).getByText('The substitute stores less energy at cranking.')).toBeTruthy();
    const window = screen.getByRole('row', { name: /Primary resistance/ });
    expect(within(window).getByText('1.30–1.70 Ω')).toBeTruthy();
    // No figure on either side prints as a dash, not as "null".
    const secondary = screen.getByRole('row', { name: /Secondary resistance/ });
    expect(within(secondary).getAllByText('—')).toHaveLength(2);
  });

  it('formats the units the check rows carry', () => {
    expect(formatFigure(90, ':1')).toBe('90:1');
    expect(formatFigure(6, 'heat step')).toBe('step\u00a06');
    expect(formatFigure(27.127, '%')).toBe('27\u00a0%');
    expect(formatFigure(-3.4, '%')).toBe('−3\u00a0%');
    expect(formatFigure(0.8, 'mm')).toBe('0.8\u00a0mm');
    expect(formatFigure(7.456, 'A')).toBe('7.5\u00a0A');
    expect(formatFigure('flat', '')).toBe('flat');
  });
});

describe('ranges', () => {
  it('prints both ends of a window to the same places', async () => {
    const { formatRange } = await import('@shared/format');
    expect(formatRange(0.5, 0.7, 'Ω')).toBe('0.5–0.7\u00a0Ω');
    expect(formatRange(0.5, 0.66, 'Ω')).toBe('0.50–0.66\u00a0Ω');
    expect(formatRange(6, 8.5, 'kΩ')).toBe('6.0–8.5\u00a0kΩ');
    expect(formatRange(1, 1, 'mm')).toBe('1\u00a0mm');
  });
});
