import { z } from 'zod';
import { text } from './text';

/**
 * Spec fields of coils, plugs and engines, in the units the trade prints them in
 * (Ω, kΩ, mH, kV, A, mm, kPa, ms). The compatibility model converts to SI at its edge.
 * These names are shared by the catalog, the price-list intake and the compatibility model.
 */

export const COIL_ARCHITECTURES = ['coil-on-plug', 'pencil', 'coil-pack', 'canister'] as const;
export const COIL_DRIVERS = ['integrated', 'external'] as const;
export const PLUG_SEATS = ['flat', 'taper'] as const;
export const PLUG_ELECTRODES = ['copper', 'platinum', 'iridium', 'fine-wire-platinum', 'fine-wire-iridium'] as const;
export const ASPIRATIONS = ['natural', 'turbo', 'supercharged'] as const;
export const PART_KINDS = ['coil', 'plug'] as const;

export const HEAT_STEP_MIN = 1; // hottest
export const HEAT_STEP_MAX = 15; // coldest

const positive = (max: number) => z.number().positive().max(max);

export const coilSpecSchema = z
  .object({
    architecture: z.enum(COIL_ARCHITECTURES),
    driver: z.enum(COIL_DRIVERS),
    outputs: z.number().int().min(1).max(12),
    connectorPins: z.number().int().min(1).max(12),
    connectorKey: text({ min: 1, max: 40 }),
    primaryOhmMin: positive(100),
    primaryOhmMax: positive(100),
    primaryInductanceMh: positive(100),
    secondaryKohmMin: positive(200).nullable().optional(),
    secondaryKohmMax: positive(200).nullable().optional(),
    turnsRatio: positive(1000),
    availableKv: positive(100).nullable().optional(),
    peakCurrentA: positive(100),
  })
  .superRefine((s, ctx) => {
    if (s.primaryOhmMin > s.primaryOhmMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['primaryOhmMin'],
        message: "must not be above the window's max",
      });
    }
    const hasMin = s.secondaryKohmMin != null;
    const hasMax = s.secondaryKohmMax != null;
    if (hasMin !== hasMax) {
      ctx.addIssue({
        code: 'custom',
        path: [hasMin ? 'secondaryKohmMax' : 'secondaryKohmMin'],
        message: 'give both ends of the secondary window, or neither',
      });
    } else if (hasMin && hasMax && s.secondaryKohmMin! > s.secondaryKohmMax!) {
      ctx.addIssue({
        code: 'custom',
        path: ['secondaryKohmMin'],
        message: "must not be above the window's max",
      });
    }
  })
  .meta({ id: 'CoilSpec' });
export type CoilSpec = z.infer<typeof coilSpecSchema>;

/** A plug spec as stored: the brand's own heat code, mapped to a heat step by the brand's table. */
export const plugSpecFields = {
  threadMm: z.number().positive().max(30),
  threadPitchMm: z.number().positive().max(3),
  reachMm: z.number().positive().max(40),
  seat: z.enum(PLUG_SEATS),
  hexMm: z.number().positive().max(30),
  gapMm: z.number().positive().max(3),
  regappable: z.boolean(),
  resistor: z.boolean(),
  resistorKohm: z.number().positive().max(20).nullable().optional(),
  projectedTip: z.boolean(),
  electrode: z.enum(PLUG_ELECTRODES),
};
export const heatStepSchema = z.number().int().min(HEAT_STEP_MIN).max(HEAT_STEP_MAX);

/** A brand's printed heat code ("6", "BR7"). */
export const heatCodeSchema = text({ min: 1, max: 20 });

export const plugSpecSchema = z
  .object({
    ...plugSpecFields,
    heatCode: heatCodeSchema,
  })
  .meta({ id: 'PlugSpec' });
export type PlugSpec = z.infer<typeof plugSpecSchema>;

/** A plug spec with its heat step resolved: what the compatibility model works on. */
export const resolvedPlugSpecSchema = z
  .object({
    ...plugSpecFields,
    heatCode: heatCodeSchema.nullable().optional(),
    heatStep: heatStepSchema,
  })
  .meta({ id: 'ResolvedPlugSpec' });
export type ResolvedPlugSpec = z.infer<typeof resolvedPlugSpecSchema>;

export const engineSpecSchema = z.object({
  code: text({ min: 1, max: 40 }),
  displacementL: z.number().positive().max(20),
  cylinders: z.number().int().min(1).max(16),
  compressionRatio: z.number().min(4).max(20),
  aspiration: z.enum(ASPIRATIONS),
  peakBoostKpa: z.number().min(0).max(400).default(0),
  rodRatio: z.number().min(2).max(6).default(3.5),
  specGapMm: z.number().positive().max(3),
  dwellMs: z.number().positive().max(20),
  crankingDwellMs: z.number().positive().max(30),
  driverCurrentLimitA: z.number().positive().max(100).nullable().optional(),
});
export type EngineSpec = z.infer<typeof engineSpecSchema>;
export type EngineSpecInput = z.input<typeof engineSpecSchema>;
export type PartKind = (typeof PART_KINDS)[number];

/** A part's spec, whichever kind it is: what the catalog answers with. */
export const partSpecSchema = z.union([coilSpecSchema, resolvedPlugSpecSchema]);
export type PartSpec = CoilSpec | ResolvedPlugSpec;
export const isCoilSpec = (spec: PartSpec): spec is CoilSpec => 'architecture' in spec;
