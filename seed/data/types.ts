import type { CoilSpec, EngineSpec, PART_KINDS, PlugSpec } from '../../shared/schemas/specs';

/**
 * Record shapes of the demo scenario. Parts are referred to by their number as printed; the
 * seeding script folds every number with `normalizePartNumber` once, on write.
 * Money is in integer cents.
 */

export type PartKind = (typeof PART_KINDS)[number];
export type PartStatus = 'active' | 'discontinued';
export type Verdict = 'go' | 'review' | 'no-go';

/** One row of a plug brand's heat table: the brand's own code and the store's heat step. */
export interface HeatCodeStep {
  code: string;
  /** 1 hottest … 15 coldest. */
  heatStep: number;
}

export interface BrandSeed {
  name: string;
  /** True for the store's own lines; foreign brands appear as interchange originals. */
  ours: boolean;
  kinds: readonly PartKind[];
  /** Empty for a brand that sells no plugs. */
  heatCodes: readonly HeatCodeStep[];
  /** How the brand's codes run, in plain words (shown beside the table in Catalog). */
  heatCodeNote: string | null;
}

/** An original-equipment brand: known only by the numbers in interchange rows. */
export interface OeBrandSeed {
  name: string;
  suppliesMakes: readonly string[];
}

export type IgnitionLayout = 'coil-on-plug' | 'pencil' | 'waste-spark-pack' | 'distributor-canister';

export interface EngineSeed extends EngineSpec {
  description: string;
  ignition: IgnitionLayout;
  /** Nominal system voltage; cranking and charging voltages are the model's defaults. */
  systemVoltage: number;
}

export interface VehicleSeed {
  year: number;
  make: string;
  model: string;
  trim: string;
  engineCode: string;
}

interface PartSeedBase {
  brand: string;
  /** As printed on the box; normalised once by the seeding script. */
  partNumber: string;
  description: string;
  /** GTIN-13 with a GS1 mod-10 check digit. */
  gtin: string;
  status: PartStatus;
}
export interface CoilPartSeed extends PartSeedBase {
  kind: 'coil';
  spec: CoilSpec;
}
export interface PlugPartSeed extends PartSeedBase {
  kind: 'plug';
  /** `heatCode` is the brand's own code, resolved through the brand's table. */
  spec: PlugSpec;
}
export type PartSeed = CoilPartSeed | PlugPartSeed;

export type FitmentPosition = 'ignition coil' | 'spark plug';

/** The part the engine is fitted with, per position. */
export interface FitmentSeed {
  engineCode: string;
  partNumber: string;
  position: FitmentPosition;
  /** Cylinders for coil-on-plug and plugs, 1 for a canister, cylinders / 2 for waste-spark packs. */
  quantity: number;
}

/**
 * Another of our parts a clerk might offer for an engine, with the verdict the compatibility
 * model gives it against the fitted part (default thresholds) and the row that decides it.
 */
export interface AlternateSeed {
  engineCode: string;
  fittedPartNumber: string;
  partNumber: string;
  expectedVerdict: Verdict;
  /** The check whose row sets the verdict; null when every row is go. */
  decidingCheck: string | null;
  why: string;
}

export type InterchangeSource = 'supplier list' | 'manual' | 'brand catalog';

export interface InterchangeSeed {
  foreignBrand: string;
  foreignNumber: string;
  ourPartNumber: string;
  source: InterchangeSource;
  /** 0 … 1: how sure whoever entered the row was. */
  confidence: number;
  /** Marks the one deliberately wrong row of the demo, which the verdict must catch as no-go. */
  demoNote?: 'wrong';
}

export interface SupersessionSeed {
  partNumber: string;
  supersededBy: string;
  effectiveDate: string;
  reason: string;
}

export interface LocationSeed {
  name: string;
  address: string;
  phone: string;
  openingHours: string;
}

export interface StockSeed {
  /** The store's name (locations.ts). */
  location: string;
  partNumber: string;
  onHand: number;
  bin: string;
}

export interface SupplierSeed {
  /** Short key used by price rows and the sample CSV file names. */
  key: string;
  name: string;
  contactEmail: string;
  phone: string;
}

export interface SupplierPriceSeed {
  supplierKey: string;
  partNumber: string;
  /** Per single part (each), not per pack. */
  costCents: number;
  listCents: number;
  coreChargeCents: number;
  /** The supplier's pack: parts are ordered in multiples of it. */
  packQty: number;
  /** ISO date. */
  effectiveDate: string;
}
