import type { z } from 'zod';
import { formatMeasure, yesNo } from './format';
import {
  COIL_ARCHITECTURES,
  COIL_DRIVERS,
  coilSpecSchema,
  HEAT_STEP_MAX,
  HEAT_STEP_MIN,
  PLUG_ELECTRODES,
  PLUG_SEATS,
  resolvedPlugSpecSchema,
  type CoilSpec,
  type PartKind,
  type ResolvedPlugSpec,
} from './schemas/specs';

/**
 * The one table of coil and plug spec fields as people read them: label, unit, decimals, the
 * kind of input and a hint. Every screen that labels a spec field, and every form message that
 * names one ("Reach must be at most 40"), reads it from here. What is valid stays in
 * shared/schemas/specs.ts; whether a field may be left empty is read from those schemas.
 */

export type SpecInput = 'number' | 'integer' | 'text' | 'select' | 'checkbox';

export interface SpecFieldDef {
  /** The key in CoilSpec / ResolvedPlugSpec. */
  name: string;
  label: string;
  input: SpecInput;
  /** Printed after the figure and beside the label: "mm", "kΩ", ":1". */
  unit?: string;
  /** Decimals a figure is printed with, at most. */
  decimals?: number;
  hint?: string;
  options?: readonly string[];
  /** Words for a select's values where the value alone reads badly. */
  words?: Readonly<Record<string, string>>;
  /** For one end of a window: the quantity both ends belong to ("Primary resistance"). */
  quantity?: string;
  /** The schema takes no value (null or absent) for it. */
  optional: boolean;
}

type Def = Omit<SpecFieldDef, 'optional'>;

const acceptsNothing = (schema: z.ZodObject, name: string): boolean => {
  const field = schema.shape[name];
  return !!field && field.safeParse(undefined).success;
};

const withOptional = (schema: z.ZodObject, defs: readonly Def[]): readonly SpecFieldDef[] =>
  defs.map((d) => ({ ...d, optional: acceptsNothing(schema, d.name) }));

const AT_20C = 'at 20 °C';

export const COIL_SPEC_FIELDS = withOptional(coilSpecSchema, [
  { name: 'architecture', label: 'Architecture', input: 'select', options: COIL_ARCHITECTURES },
  {
    name: 'driver',
    label: 'Driver',
    input: 'select',
    options: COIL_DRIVERS,
    words: { integrated: 'integrated igniter', external: 'external driver' },
  },
  { name: 'outputs', label: 'Outputs', input: 'integer', hint: 'towers or leads' },
  { name: 'connectorPins', label: 'Connector pins', input: 'integer' },
  { name: 'connectorKey', label: 'Connector key', input: 'text' },
  {
    name: 'primaryOhmMin',
    label: 'Primary resistance, min',
    quantity: 'Primary resistance',
    input: 'number',
    unit: 'Ω',
    decimals: 2,
    hint: AT_20C,
  },
  {
    name: 'primaryOhmMax',
    label: 'Primary resistance, max',
    quantity: 'Primary resistance',
    input: 'number',
    unit: 'Ω',
    decimals: 2,
    hint: AT_20C,
  },
  { name: 'primaryInductanceMh', label: 'Primary inductance', input: 'number', unit: 'mH', decimals: 2 },
  {
    name: 'secondaryKohmMin',
    label: 'Secondary resistance, min',
    quantity: 'Secondary resistance',
    input: 'number',
    unit: 'kΩ',
    decimals: 1,
  },
  {
    name: 'secondaryKohmMax',
    label: 'Secondary resistance, max',
    quantity: 'Secondary resistance',
    input: 'number',
    unit: 'kΩ',
    decimals: 1,
  },
  { name: 'turnsRatio', label: 'Turns ratio', input: 'number', unit: ':1', decimals: 1, hint: 'secondary turns per primary turn' },
  {
    name: 'availableKv',
    label: 'Available voltage',
    input: 'number',
    unit: 'kV',
    decimals: 1,
    hint: 'as rated; empty: estimated from the turns ratio',
  },
  { name: 'peakCurrentA', label: 'Peak primary current', input: 'number', unit: 'A', decimals: 1 },
] satisfies (Def & { name: keyof CoilSpec })[]);

export const PLUG_SPEC_FIELDS = withOptional(resolvedPlugSpecSchema, [
  { name: 'threadMm', label: 'Thread', input: 'number', unit: 'mm', decimals: 2 },
  { name: 'threadPitchMm', label: 'Thread pitch', input: 'number', unit: 'mm', decimals: 2 },
  { name: 'reachMm', label: 'Reach', input: 'number', unit: 'mm', decimals: 2 },
  { name: 'seat', label: 'Seat', input: 'select', options: PLUG_SEATS },
  { name: 'hexMm', label: 'Hex', input: 'number', unit: 'mm', decimals: 2 },
  { name: 'heatStep', label: 'Heat step', input: 'integer', hint: `${HEAT_STEP_MIN} hottest … ${HEAT_STEP_MAX} coldest` },
  { name: 'heatCode', label: 'Heat code', input: 'text', hint: "the brand's own code" },
  { name: 'gapMm', label: 'Gap', input: 'number', unit: 'mm', decimals: 2, hint: 'as supplied' },
  { name: 'resistorKohm', label: 'Resistor value', input: 'number', unit: 'kΩ', decimals: 1 },
  { name: 'electrode', label: 'Electrode', input: 'select', options: PLUG_ELECTRODES },
  { name: 'resistor', label: 'Resistor', input: 'checkbox' },
  { name: 'regappable', label: 'May be re-gapped', input: 'checkbox' },
  { name: 'projectedTip', label: 'Projected tip', input: 'checkbox' },
] satisfies (Def & { name: keyof ResolvedPlugSpec })[]);

export const specFieldsOf = (kind: PartKind): readonly SpecFieldDef[] => (kind === 'coil' ? COIL_SPEC_FIELDS : PLUG_SPEC_FIELDS);

const BY_NAME = new Map([...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS].map((f) => [f.name, f] as const));

export const specField = (name: string): SpecFieldDef | undefined => BY_NAME.get(name);

/** "reachMm" → "Reach"; a name not in the table is returned as given. */
export const specLabel = (name: string): string => BY_NAME.get(name)?.label ?? name;

/** "primaryOhmMin" → "Primary resistance": what a window's end measures; its label when it is not a window's end. */
export const specQuantity = (name: string): string => {
  const f = BY_NAME.get(name);
  return f?.quantity ?? f?.label ?? name;
};

/** One spec value as text with its unit: "12.7 mm", "0.5 Ω", "85:1", "yes", "integrated igniter"; "none" for no value. */
export function formatSpecValue(name: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return 'none';
  if (typeof value === 'boolean') return yesNo(value);
  const f = BY_NAME.get(name);
  if (typeof value === 'number' && f?.unit) return formatMeasure(value, f.unit, f.decimals);
  if (typeof value === 'string' && f?.words?.[value]) return f.words[value];
  return String(value);
}
