import { coilSpecSchema, plugSpecSchema } from '../schemas/specs';

/**
 * The Arcwise fields a supplier price list can fill, their header synonyms and the intake's
 * limits. Shared so the mapping screen and the server agree on names, required fields and limits.
 */

export const BASE_FIELDS = ['partNumber', 'brand', 'description', 'cost', 'list', 'core', 'packQty', 'gtin', 'supersedes', 'kind'] as const;
export type BaseField = (typeof BASE_FIELDS)[number];

// Spec field names come from the spec schemas so a new spec field reaches the intake unasked.
export type CoilSpecField = keyof typeof coilSpecSchema.shape;
export type PlugSpecField = keyof typeof plugSpecSchema.shape;
export const COIL_SPEC_FIELDS = Object.keys(coilSpecSchema.shape) as CoilSpecField[];
export const PLUG_SPEC_FIELDS = Object.keys(plugSpecSchema.shape) as PlugSpecField[];

export type PriceListField = BaseField | CoilSpecField | PlugSpecField;
export const PRICE_LIST_FIELDS: readonly [PriceListField, ...PriceListField[]] = [...BASE_FIELDS, ...COIL_SPEC_FIELDS, ...PLUG_SPEC_FIELDS];

/**
 * Required: the part (number and brand, since two brands may print the same number) and both
 * prices. Cost is required as well as list because the buyer reviews margin in the preview and
 * a list without cost would commit a part whose margin nobody can see.
 */
export const REQUIRED_FIELDS: readonly PriceListField[] = ['partNumber', 'brand', 'cost', 'list'];

export const FIELD_LABELS: Record<PriceListField, string> = {
  partNumber: 'Part number',
  brand: 'Brand',
  description: 'Description',
  cost: 'Cost',
  list: 'List price',
  core: 'Core charge',
  packQty: 'Pack quantity',
  gtin: 'GTIN (UPC/EAN)',
  supersedes: 'Supersedes (old number)',
  kind: 'Kind (coil or plug)',
  architecture: 'Coil architecture',
  driver: 'Coil driver',
  outputs: 'Coil outputs',
  connectorPins: 'Connector pins',
  connectorKey: 'Connector key',
  primaryOhmMin: 'Primary resistance min (Ω)',
  primaryOhmMax: 'Primary resistance max (Ω)',
  primaryInductanceMh: 'Primary inductance (mH)',
  secondaryKohmMin: 'Secondary resistance min (kΩ)',
  secondaryKohmMax: 'Secondary resistance max (kΩ)',
  turnsRatio: 'Turns ratio',
  availableKv: 'Available voltage (kV)',
  peakCurrentA: 'Peak primary current (A)',
  threadMm: 'Thread (mm)',
  threadPitchMm: 'Thread pitch (mm)',
  reachMm: 'Reach (mm)',
  seat: 'Seat',
  hexMm: 'Hex (mm)',
  gapMm: 'Gap (mm)',
  regappable: 'Regappable',
  resistor: 'Resistor',
  resistorKohm: 'Resistor (kΩ)',
  projectedTip: 'Projected tip',
  electrode: 'Electrode',
  heatCode: 'Heat code',
};

/**
 * Header synonyms, compared after `normalizeHeader` (case, accents, punctuation and spacing
 * folded, "#" read as "no"), so "Part #", "PART NO." and "part_no" are one entry. Each field's
 * own name and label match too. "Superseded by" is deliberately absent: it points the other way.
 */
export const HEADER_SYNONYMS: Record<PriceListField, readonly string[]> = {
  partNumber: [
    'part no',
    'part number',
    'part',
    'item no',
    'item number',
    'item',
    'sku',
    'article',
    'article no',
    'art no',
    'product code',
    'product no',
    'mfr part no',
    'mpn',
    'catalog no',
    'cat no',
    'stock no',
    'p/n',
    'pn',
    'number',
    'code',
  ],
  brand: ['brand', 'mfr', 'mfg', 'manufacturer', 'make', 'maker', 'brand name', 'product line', 'line'],
  description: [
    'description',
    'desc',
    'descr',
    'name',
    'product name',
    'item name',
    'item description',
    'part description',
    'product description',
    'title',
    'text',
  ],
  cost: [
    'cost',
    'net',
    'net price',
    'net cost',
    'dealer',
    'dealer price',
    'dealer cost',
    'unit cost',
    'your cost',
    'your price',
    'buy price',
    'purchase price',
    'wholesale',
    'wholesale price',
    'wd',
    'wd price',
    'price',
    'unit price',
  ],
  list: [
    'list',
    'list price',
    'retail',
    'retail price',
    'msrp',
    'rrp',
    'srp',
    'suggested retail',
    'sell price',
    'selling price',
    'jobber',
    'jobber price',
  ],
  core: ['core', 'core charge', 'core chg', 'core price', 'core deposit', 'core value', 'deposit', 'core cost'],
  packQty: [
    'pack',
    'pack qty',
    'qty/pack',
    'qty per pack',
    'pack size',
    'pack quantity',
    'pkg qty',
    'package qty',
    'per pack',
    'units per pack',
    'box qty',
    'pcs per pack',
  ],
  gtin: ['gtin', 'ean', 'upc', 'barcode', 'bar code', 'ean13', 'ean code', 'upc code', 'ean/upc', 'upc/ean', 'gtin13', 'gtin14', 'gtin12'],
  supersedes: [
    'supersedes',
    'replaces',
    'supersession',
    'superseded number',
    'old number',
    'old part no',
    'previous part no',
    'former part no',
    'replaced part no',
    'replaces part no',
    'supersedes part no',
  ],
  kind: ['kind', 'type', 'category', 'part type', 'product type', 'item type', 'product group', 'group'],
  architecture: ['architecture', 'coil type', 'coil design', 'design'],
  driver: ['driver', 'igniter', 'ignitor', 'coil driver'],
  outputs: ['outputs', 'towers', 'coil outputs', 'no of outputs'],
  connectorPins: ['connector pins', 'pins', 'pin count', 'terminals'],
  connectorKey: ['connector', 'connector key', 'connector type', 'plug connector'],
  primaryOhmMin: ['primary ohm min', 'primary min', 'primary resistance min', 'pri min', 'pri ohm min'],
  primaryOhmMax: ['primary ohm max', 'primary max', 'primary resistance max', 'pri max', 'pri ohm max'],
  primaryInductanceMh: ['primary inductance', 'inductance', 'inductance mh', 'primary inductance mh'],
  secondaryKohmMin: ['secondary kohm min', 'secondary min', 'secondary resistance min', 'sec min'],
  secondaryKohmMax: ['secondary kohm max', 'secondary max', 'secondary resistance max', 'sec max'],
  turnsRatio: ['turns ratio', 'ratio', 'winding ratio'],
  availableKv: ['available kv', 'available voltage', 'output kv', 'output voltage', 'max kv', 'kv'],
  peakCurrentA: ['peak current', 'peak current a', 'primary current', 'peak a', 'current'],
  threadMm: ['thread', 'thread mm', 'thread size', 'thread dia', 'thread diameter'],
  threadPitchMm: ['thread pitch', 'pitch', 'pitch mm'],
  reachMm: ['reach', 'reach mm', 'thread reach', 'thread length'],
  seat: ['seat', 'seat type', 'seat style'],
  hexMm: ['hex', 'hex mm', 'hex size', 'wrench size'],
  gapMm: ['gap', 'gap mm', 'electrode gap', 'plug gap'],
  regappable: ['regappable', 'gap adjustable', 'adjustable gap'],
  resistor: ['resistor', 'resistor plug', 'resistor type', 'suppressed'],
  resistorKohm: ['resistor kohm', 'resistance kohm', 'resistor value', 'resistance'],
  projectedTip: ['projected tip', 'projected', 'tip projection'],
  electrode: ['electrode', 'electrode material', 'tip material', 'center electrode'],
  heatCode: ['heat code', 'heat range', 'heat', 'heat rating'],
};

/**
 * Every limit of the intake, in one place. maxFileBytes is the default; Settings may lower or
 * raise it per store.
 */
export const PRICE_LIST_LIMITS = {
  /** A longer cell rejects its row. */
  maxFieldChars: 10_000,
  /**
   * A record longer than this refuses the file: the parser would otherwise buffer an unclosed
   * quote's whole remainder in memory. Between maxFieldChars and this, the row alone is rejected.
   */
  maxRecordChars: 1_000_000,
  /** 50 MiB. */
  maxFileBytes: 50 * 1024 * 1024,
  maxColumns: 200,
  maxHeaderChars: 200,
  /** Bounds the duplicate-number index kept while parsing. */
  maxDataRows: 1_000_000,
  maxPartNumberChars: 40,
  maxBrandChars: 80,
  maxPackQty: 10_000,
} as const;
