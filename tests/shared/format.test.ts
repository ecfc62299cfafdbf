import { describe, expect, it } from 'vitest';
import { formatBytes, formatCount, formatDate, formatDateTime, formatPercentChange, formatStock, formatTime } from '../../shared/format';
import { coilSpecSchema, resolvedPlugSpecSchema } from '../../shared/schemas/specs';
import { COIL_SPEC_FIELDS, formatSpecValue, PLUG_SPEC_FIELDS, specLabel } from '../../shared/spec-fields';

describe('dates: one format for the whole app', () => {
  // Local-time dates, so the checks hold in any time zone the machine runs in.
  it('prints a day as "4 Dec 2026" and a moment as "4 Dec 2026, 15:04" on a 24-hour clock', () => {
    const at = new Date(2026, 11, 4, 15, 4, 59);
    expect(formatDate(at)).toBe('4 Dec 2026');
    expect(formatDateTime(at)).toBe('4 Dec 2026, 15:04');
    expect(formatTime(new Date(2026, 0, 9, 7, 5))).toBe('07:05');
    expect(formatDateTime(new Date(2026, 8, 30, 0, 0))).toBe('30 Sep 2026, 00:00');
  });

  it('reads ISO text as the API sends it and hands back text that is no date', () => {
    const iso = new Date(2026, 11, 4, 15, 4).toISOString();
    expect(formatDateTime(iso)).toBe('4 Dec 2026, 15:04');
    expect(formatDate('not a date')).toBe('not a date');
  });

  it("prints a calendar day (a price's effective date) as that day in any time zone", () => {
    // Run under TZ=America/Los_Angeles too: read as UTC midnight it would be the 3rd there.
    expect(formatDate('2026-12-04')).toBe('4 Dec 2026');
    expect(formatDate('2026-01-01')).toBe('1 Jan 2026');
  });
});

describe('counts, moves and stock', () => {
  it('groups counts, signs price moves with a true minus, sizes files', () => {
    expect(formatCount(12345)).toBe('12,345');
    expect(formatPercentChange(18.75)).toBe('+18.8%');
    expect(formatPercentChange(-2.59)).toBe('\u22122.6%');
    expect(formatPercentChange(0)).toBe('0.0%');
    expect(formatBytes(512)).toBe('512 B');
    expect(formatBytes(2048)).toBe('2 KB');
    expect(formatBytes(3.5 * 1024 * 1024)).toBe('3.5 MB');
  });

  it('prints stock as count and bin for the store, in stock or not for a technician', () => {
    expect(formatStock({ onHand: 14, bin: 'A-3', inStock: true })).toBe('14 on hand · bin A-3');
    expect(formatStock({ onHand: 0, bin: '', inStock: false })).toBe('0 on hand');
    expect(formatStock({ inStock: true })).toBe('in stock');
    expect(formatStock({ inStock: false })).toBe('not in stock');
  });
});

describe('the spec-field table', () => {
  it('labels every field of the coil and plug schemas, and only those', () => {
    expect(COIL_SPEC_FIELDS.map((f) => f.name).sort()).toEqual(Object.keys(coilSpecSchema.shape).sort());
    expect(PLUG_SPEC_FIELDS.map((f) => f.name).sort()).toEqual(Object.keys(resolvedPlugSpecSchema.shape).sort());
  });

  it('reads which fields may be left empty from the schemas', () => {
    const optional = [...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS].filter((f) => f.optional).map((f) => f.name);
    expect(optional.sort()).toEqual(['availableKv', 'heatCode', 'resistorKohm', 'secondaryKohmMax', 'secondaryKohmMin']);
  });

  it('prints a value with its label, unit and decimals', () => {
    expect(specLabel('reachMm')).toBe('Reach');
    expect(specLabel('noSuchField')).toBe('noSuchField');
    expect(formatSpecValue('reachMm', 12.7)).toBe('12.7\u00a0mm');
    expect(formatSpecValue('secondaryKohmMin', 6.25)).toBe('6.3\u00a0kΩ');
    expect(formatSpecValue('turnsRatio', 85)).toBe('85:1');
    expect(formatSpecValue('driver', 'integrated')).toBe('integrated igniter');
    expect(formatSpecValue('resistor', true)).toBe('yes');
    expect(formatSpecValue('availableKv', null)).toBe('none');
  });
});
