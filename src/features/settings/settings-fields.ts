import { get } from 'react-hook-form';
import { DEFAULT_SETTINGS } from '@shared/schemas/settings';

/**
 * The Settings form's fields: every compatibility threshold and load point and the price-list
 * settings, by their path in the settings document, with the unit each is kept in. Defaults are
 * read from shared/ (DEFAULT_SETTINGS), never written again here; the form checks them with the
 * API's own schema (settingsSchema).
 */

export interface SettingField {
  path: string;
  label: string;
  unit: string;
  hint?: string;
}

export interface SettingGroup {
  id: string;
  title: string;
  note?: string;
  fields: SettingField[];
}

export const SETTING_GROUPS: SettingGroup[] = [
  {
    id: 'voltages',
    title: 'System voltages',
    note: 'A 12 V system reads about 10 V cranking and 14–15 V charging.',
    fields: [
      { path: 'compat.crankingVoltageV', label: 'Cranking voltage', unit: 'V' },
      { path: 'compat.chargingVoltageV', label: 'Charging voltage', unit: 'V' },
      {
        path: 'compat.flybackPeakV',
        label: 'Primary flyback peak',
        unit: 'V',
        hint: 'estimates available voltage where a coil states none',
      },
    ],
  },
  {
    id: 'coil',
    title: 'Coil checks',
    fields: [
      {
        path: 'compat.primaryWindowWidenPct',
        label: 'Primary window widened by',
        unit: '%',
        hint: 'go: substitute window inside the widened original',
      },
      {
        path: 'compat.driverCurrentReviewPct',
        label: 'Driver current review margin',
        unit: '%',
        hint: 'review: up to this much above what is allowed',
      },
      { path: 'compat.energyGoRatio', label: 'Energy at cranking, go from', unit: '× original' },
      { path: 'compat.energyReviewRatio', label: 'Energy at cranking, review from', unit: '× original' },
      { path: 'compat.reserveGoPct', label: 'Voltage reserve for go', unit: '%', hint: 'at the worst load point' },
      { path: 'compat.availableReviewRatio', label: 'Available voltage, review from', unit: '× original' },
      { path: 'compat.turnsRatioTolerancePct', label: 'Turns ratio tolerance, ±', unit: '%' },
    ],
  },
  {
    id: 'plug',
    title: 'Plug checks',
    fields: [
      { path: 'compat.reachToleranceMm', label: 'Reach tolerance, ±', unit: 'mm' },
      { path: 'compat.gapToleranceMm', label: 'Gap tolerance, ±', unit: 'mm', hint: 'against the engine’s spec gap' },
      { path: 'compat.requiredReviewRatio', label: 'Required voltage, review up to', unit: '× original' },
      { path: 'compat.wearAllowanceMm', label: 'Gap wear allowance', unit: 'mm', hint: 'added to the gap for required voltage' },
    ],
  },
  {
    id: 'physics',
    title: 'Model constants',
    fields: [
      { path: 'compat.polytropicN', label: 'Polytropic exponent n', unit: '', hint: 'compression; usually 1.2–1.3' },
      { path: 'compat.copperAlphaPerK', label: 'Copper temperature coefficient', unit: '/K', hint: 'bench test correction to 20 °C' },
      { path: 'compat.shortFractionOfLow', label: 'Short below', unit: '× window low end', hint: 'bench test' },
    ],
  },
  {
    id: 'price-list',
    title: 'Price lists',
    fields: [
      { path: 'priceList.flagThresholdPct', label: 'Flag price moves above', unit: '%' },
      { path: 'priceList.maxFileMb', label: 'Largest file', unit: 'MB' },
    ],
  },
];

export const LOAD_POINT_ROWS = [
  { key: 'idle', label: 'Idle' },
  { key: 'cruise', label: 'Cruise' },
  { key: 'full', label: 'Full load' },
  { key: 'boost', label: 'Boost' },
] as const;

export const LOAD_POINT_COLUMNS = [
  { key: 'mapKpa', label: 'Manifold pressure', unit: 'kPa' },
  { key: 'advanceDeg', label: 'Spark advance', unit: '° BTDC' },
  { key: 'tempK', label: 'Intake temperature', unit: 'K' },
] as const;

/** A load point's field path; boost's pressure is an addition on top of full load plus the engine's peak boost. */
export function loadPointPath(row: (typeof LOAD_POINT_ROWS)[number]['key'], column: (typeof LOAD_POINT_COLUMNS)[number]['key']): string {
  return row === 'boost' && column === 'mapKpa' ? 'compat.loadPoints.boost.mapKpaAboveFull' : `compat.loadPoints.${row}.${column}`;
}

/** The settings' default at a path, as printed beside its field. */
export const defaultAt = (path: string): string => String(get(DEFAULT_SETTINGS, path) ?? '');
