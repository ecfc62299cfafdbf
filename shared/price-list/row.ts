import { z } from 'zod';
import { GTIN_LENGTHS, gtinCheckDigit, isValidGtin } from '../gtin';
import { parseMoney } from '../money';
import { normalizePartNumber } from '../part-number';
import { defuseFormula, formulaSign, startsLikeFormula } from './formula-text';
import { coilSpecSchema, plugSpecSchema, type CoilSpec, type PART_KINDS, type PlugSpec } from '../schemas/specs';
import {
  COIL_SPEC_FIELDS,
  PLUG_SPEC_FIELDS,
  PRICE_LIST_LIMITS,
  type CoilSpecField,
  type PlugSpecField,
  type PriceListField,
} from './fields';
import type { ResolvedMapping } from './mapping';

/** One reason a line of the file was rejected. `column` is the header as printed in the file. */
export interface RowError {
  line: number;
  column: string | null;
  field: PriceListField | null;
  message: string;
}

export type PartKind = (typeof PART_KINDS)[number];

/** A price-list line that passed every check, in Arcwise's units (cents, normalised numbers). */
export interface NormalisedRow {
  line: number;
  partNumber: string;
  partNumberNorm: string;
  brand: string;
  description: string | null;
  costCents: number;
  listCents: number;
  coreCents: number | null;
  packQty: number | null;
  gtin: string | null;
  supersedes: string | null;
  supersedesNorm: string | null;
  kind: PartKind | null;
  coil?: Partial<CoilSpec>;
  plug?: Partial<PlugSpec>;
}

/**
 * A rejected line still names its part when it can, so the parser can tell that the same part
 * appears twice even when one of the two lines is also wrong in another way.
 */
export type RowResult =
  { ok: true; row: NormalisedRow } | { ok: false; errors: RowError[]; partNumberNorm: string | null; brand: string | null };

export interface RowOptions {
  maxFieldChars?: number;
}

type Converted = { ok: true; value: unknown } | { ok: false; reason: string };
type SpecConverter = (cell: string) => Converted;

const KIND_WORDS: Record<string, PartKind> = {
  coil: 'coil',
  coils: 'coil',
  'ignition coil': 'coil',
  'ignition coils': 'coil',
  cop: 'coil',
  'coil pack': 'coil',
  'coil on plug': 'coil',
  'pencil coil': 'coil',
  plug: 'plug',
  plugs: 'plug',
  'spark plug': 'plug',
  'spark plugs': 'plug',
  sparkplug: 'plug',
  sparkplugs: 'plug',
};
const TRUE_WORDS = new Set(['y', 'yes', 'true', '1']);
const FALSE_WORDS = new Set(['n', 'no', 'false', '0']);
const ENUM_ALIASES: Record<string, string> = { cop: 'coil-on-plug' };
const UNIT_OF_SUFFIX: Record<string, string> = { Mm: 'mm', Ohm: 'ohm', Kohm: 'kohm', Mh: 'mh', Kv: 'kv', A: 'a' };
const DECIMAL = /^(\d+(?:[.,]\d+)?|[.,]\d+)$/;

function quote(cell: string): string {
  return JSON.stringify(cell.length > 40 ? `${cell.slice(0, 40)}…` : cell);
}

/** Number cells, with a decimal comma and the field's own unit tolerated ("0,8 mm", "0.5 Ω"). */
function numberConverter(field: string): SpecConverter {
  const suffix = /(Mm|Kohm|Ohm|Mh|Kv|A)(?:Min|Max)?$/.exec(field)?.[1];
  const unit = suffix === undefined ? undefined : UNIT_OF_SUFFIX[suffix];
  return (cell) => {
    let s = cell.replace(/kΩ$/i, 'kohm').replace(/Ω$/, 'ohm');
    if (unit !== undefined && s.toLowerCase().endsWith(unit)) s = s.slice(0, -unit.length).trimEnd();
    if (!DECIMAL.test(s)) return { ok: false, reason: `${quote(cell)} is not a number` };
    return { ok: true, value: Number(s.replace(',', '.')) };
  };
}

function enumConverter(options: readonly string[]): SpecConverter {
  return (cell) => {
    const folded = cell.toLowerCase().replace(/[\s_]+/g, '-');
    const value = ENUM_ALIASES[folded] ?? folded;
    return options.includes(value) ? { ok: true, value } : { ok: false, reason: `${quote(cell)} is not one of ${options.join(', ')}` };
  };
}

function booleanConverter(cell: string): Converted {
  const folded = cell.toLowerCase();
  if (TRUE_WORDS.has(folded)) return { ok: true, value: true };
  if (FALSE_WORDS.has(folded)) return { ok: true, value: false };
  return { ok: false, reason: `${quote(cell)} is not yes or no` };
}

/** Reads the cell type off the spec field's own zod schema, so the ranges stay in specs.ts. */
function converterFor(field: string, schema: z.ZodType): SpecConverter {
  let inner: z.ZodType = schema;
  while (inner instanceof z.ZodOptional || inner instanceof z.ZodNullable) {
    inner = inner.unwrap() as z.ZodType;
  }
  if (inner instanceof z.ZodNumber) return numberConverter(field);
  if (inner instanceof z.ZodEnum) return enumConverter(inner.options.map(String));
  if (inner instanceof z.ZodBoolean) return booleanConverter;
  return (cell) => (startsLikeFormula(cell) ? { ok: false, reason: formulaReason(cell, 'a code') } : { ok: true, value: cell });
}

/** Why a cell that starts like a formula is refused where text cannot be defused: a number or a code. */
function formulaReason(cell: string, what: string): string {
  return `${quote(cell)} starts with “${formulaSign(cell)}”, as a spreadsheet formula does; ${what} never does`;
}

function issueReason(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'too_big':
      return `is out of range: at most ${issue.maximum}`;
    case 'too_small':
      return issue.inclusive ? `is out of range: at least ${issue.minimum}` : `is out of range: must be above ${issue.minimum}`;
    case 'invalid_type':
      return issue.expected === 'int' ? 'must be a whole number' : `must be a ${issue.expected}`;
    default:
      return issue.message;
  }
}

interface SpecColumn {
  family: 'coil' | 'plug';
  field: CoilSpecField | PlugSpecField;
  column: number;
  convert: SpecConverter;
  schema: z.ZodType;
}

function specColumns(mapping: ResolvedMapping): SpecColumn[] {
  const out: SpecColumn[] = [];
  for (const field of COIL_SPEC_FIELDS) {
    const column = mapping.columns[field];
    const schema: z.ZodType = coilSpecSchema.shape[field];
    if (column !== undefined) out.push({ family: 'coil', field, column, schema, convert: converterFor(field, schema) });
  }
  for (const field of PLUG_SPEC_FIELDS) {
    const column = mapping.columns[field];
    const schema: z.ZodType = plugSpecSchema.shape[field];
    if (column !== undefined) out.push({ family: 'plug', field, column, schema, convert: converterFor(field, schema) });
  }
  return out;
}

/**
 * Cleans a barcode cell. Spreadsheets drop a UPC's leading zero (11 digits) or print it as
 * 6.01234E+11; the first is padded back (padding cannot hide a wrong check digit, since GS1
 * weights run from the right), the second is refused because its digits are already lost.
 */
function checkGtin(cell: string): { ok: true; gtin: string } | { ok: false; reason: string } {
  if (/^\d+(?:[.,]\d+)?e\+?\d+$/i.test(cell)) {
    return { ok: false, reason: `${quote(cell)} was turned into a number by a spreadsheet; export the column as text` };
  }
  let digits = cell.replace(/[\s-]/g, '');
  if (!/^\d+$/.test(digits)) return { ok: false, reason: `${quote(cell)} is not a GTIN: digits only` };
  if (digits.length >= 9 && digits.length <= 11) digits = digits.padStart(12, '0');
  if (!(GTIN_LENGTHS as readonly number[]).includes(digits.length)) {
    return { ok: false, reason: `${quote(cell)} is not a GTIN: 8, 12, 13 or 14 digits` };
  }
  if (!isValidGtin(digits)) {
    const expected = gtinCheckDigit(digits.slice(0, -1));
    return { ok: false, reason: `${quote(cell)} has a wrong check digit (expected ${expected})` };
  }
  return { ok: true, gtin: digits };
}

/**
 * Validates the lines of one file against its mapping. A class rather than closures because it
 * runs for every line: per-line state lives in fields, so a line allocates only its result.
 */
export class RowValidator {
  private readonly maxFieldChars: number;
  private readonly headers: readonly string[];
  private readonly columns: Partial<Record<PriceListField, number>>;
  private readonly width: number;
  private readonly mappedColumns: number[];
  private readonly mappedFields: PriceListField[];
  private readonly specs: SpecColumn[];
  /** Columns whose cell failed the length or decoding check on the current line. */
  private readonly unreadable: Uint8Array;
  private cells: readonly string[] = [];
  private line = 0;
  private errors: RowError[] = [];

  constructor(mapping: ResolvedMapping, opts: RowOptions = {}) {
    this.maxFieldChars = opts.maxFieldChars ?? PRICE_LIST_LIMITS.maxFieldChars;
    this.headers = mapping.headers;
    this.columns = mapping.columns;
    this.width = mapping.headers.length;
    const mapped = Object.entries(mapping.columns) as [PriceListField, number][];
    this.mappedFields = mapped.map(([field]) => field);
    this.mappedColumns = mapped.map(([, column]) => column);
    this.specs = specColumns(mapping);
    this.unreadable = new Uint8Array(this.width);
  }

  validate(cells: readonly string[], line: number): RowResult {
    this.cells = cells;
    this.line = line;
    this.errors = [];
    this.unreadable.fill(0);
    if (cells.length !== this.width && !this.widthTolerable(cells)) {
      // A shifted row would put a description into a price: reject the line as a whole.
      this.fail(
        null,
        `the line has ${cells.length} fields, the header has ${this.width}: a missing delimiter, or an unquoted delimiter inside a field`,
      );
      return { ok: false, errors: this.errors, partNumberNorm: null, brand: null };
    }
    this.checkCells();

    const partNumber = this.required('partNumber');
    const partNumberNorm = partNumber === '' ? null : normalizePartNumber(partNumber);
    if (startsLikeFormula(partNumber)) {
      this.fail('partNumber', formulaReason(partNumber, 'a part number'));
    } else if (partNumber.length > PRICE_LIST_LIMITS.maxPartNumberChars) {
      this.fail('partNumber', `longer than ${PRICE_LIST_LIMITS.maxPartNumberChars} characters`);
    } else if (partNumberNorm === '') {
      this.fail('partNumber', `${quote(partNumber)} has no letters or digits`);
    }
    const brand = this.required('brand');
    if (startsLikeFormula(brand)) {
      this.fail('brand', formulaReason(brand, 'a brand name'));
    } else if (brand.length > PRICE_LIST_LIMITS.maxBrandChars) {
      this.fail('brand', `longer than ${PRICE_LIST_LIMITS.maxBrandChars} characters`);
    }
    const costCents = this.money('cost', true);
    const listCents = this.money('list', true);
    const coreCents = this.money('core', false);
    const packQty = this.packQty();
    const gtin = this.gtin();

    const supersedes = this.text('supersedes') || null;
    const supersedesNorm = supersedes === null ? null : normalizePartNumber(supersedes) || null;
    if (supersedes !== null && startsLikeFormula(supersedes)) {
      this.fail('supersedes', formulaReason(supersedes, 'a part number'));
    } else if (supersedes !== null && supersedes.length > PRICE_LIST_LIMITS.maxPartNumberChars) {
      this.fail('supersedes', `longer than ${PRICE_LIST_LIMITS.maxPartNumberChars} characters`);
    } else if (supersedesNorm !== null && supersedesNorm === partNumberNorm) {
      this.fail('supersedes', 'the part cannot supersede itself');
    }

    const kindCell = this.text('kind');
    let kind: PartKind | null = null;
    if (kindCell !== '') {
      kind =
        KIND_WORDS[
          kindCell
            .toLowerCase()
            .replace(/[^a-z]+/g, ' ')
            .trim()
        ] ?? null;
      if (kind === null) this.fail('kind', `unknown kind ${quote(kindCell)}: expected coil or plug`);
    }
    const { coil, plug } = this.specValues();
    if (coil && plug) {
      this.fail(null, 'the line carries both coil and plug spec values');
    } else if ((coil && kind === 'plug') || (plug && kind === 'coil')) {
      this.fail('kind', `the line is a ${kind} but carries ${coil ? 'coil' : 'plug'} spec values`);
    } else if (kind === null && kindCell === '') {
      // Spec columns say what the part is when the file has no kind.
      kind = coil ? 'coil' : plug ? 'plug' : null;
    }
    this.checkWindow(coil?.primaryOhmMin, coil?.primaryOhmMax, 'primaryOhmMin');
    this.checkWindow(coil?.secondaryKohmMin, coil?.secondaryKohmMax, 'secondaryKohmMin');

    if (this.errors.length > 0 || costCents === null || listCents === null || !partNumberNorm) {
      return { ok: false, errors: this.errors, partNumberNorm: partNumberNorm || null, brand: brand || null };
    }
    const row: NormalisedRow = {
      line,
      partNumber,
      partNumberNorm,
      brand,
      description: this.description(),
      costCents,
      listCents,
      coreCents,
      packQty,
      gtin,
      supersedes,
      supersedesNorm,
      kind,
    };
    if (coil) row.coil = coil;
    if (plug) row.plug = plug;
    return { ok: true, row };
  }

  /** Extra cells are tolerated when empty: some exports end every line with a delimiter. */
  private widthTolerable(cells: readonly string[]): boolean {
    if (cells.length < this.width) return false;
    for (let i = this.width; i < cells.length; i++) if ((cells[i] ?? '').trim() !== '') return false;
    return true;
  }

  private checkCells(): void {
    for (let i = 0; i < this.mappedColumns.length; i++) {
      const column = this.mappedColumns[i] ?? 0;
      const field = this.mappedFields[i] ?? null;
      const cell = this.cells[column] ?? '';
      if (cell.length > this.maxFieldChars) {
        this.unreadable[column] = 1;
        this.fail(field, `longer than ${this.maxFieldChars.toLocaleString('en-US')} characters (${cell.length.toLocaleString('en-US')})`);
      } else if (cell.includes('\uFFFD')) {
        this.unreadable[column] = 1;
        this.fail(field, 'contains bytes that are not valid text in the file’s encoding; save the file as UTF-8');
      }
    }
  }

  private fail(field: PriceListField | null, message: string): void {
    const index = field === null ? undefined : this.columns[field];
    const column = index === undefined ? null : this.headers[index] || `column ${index + 1}`;
    this.errors.push({ line: this.line, column, field, message });
  }

  /** The trimmed cell, or '' when unmapped or already failed (so it is not parsed further). */
  private text(field: PriceListField): string {
    const index = this.columns[field];
    if (index === undefined || this.unreadable[index] === 1) return '';
    return (this.cells[index] ?? '').trim();
  }

  private required(field: PriceListField): string {
    const value = this.text(field);
    const index = this.columns[field];
    if (value === '' && (index === undefined || this.unreadable[index] !== 1)) {
      this.fail(field, 'required, but the cell is empty');
    }
    return value;
  }

  /** Free text: one that starts like a formula is kept, defused, rather than costing the line. */
  private description(): string | null {
    const cell = this.text('description');
    if (cell === '') return null;
    return startsLikeFormula(cell) ? defuseFormula(cell) : cell;
  }

  private money(field: 'cost' | 'list' | 'core', isRequired: boolean): number | null {
    const cell = isRequired ? this.required(field) : this.text(field);
    if (cell === '') return null;
    const parsed = parseMoney(cell);
    if (!parsed.ok) {
      this.fail(field, `${quote(cell)} ${parsed.reason}`);
      return null;
    }
    if (isRequired && parsed.cents === 0) this.fail(field, 'must be above zero');
    return parsed.cents;
  }

  private packQty(): number | null {
    const cell = this.text('packQty');
    if (cell === '') return null;
    const qty = /^\d+$/.test(cell) ? Number(cell) : NaN;
    if (qty >= 1 && qty <= PRICE_LIST_LIMITS.maxPackQty) return qty;
    this.fail('packQty', `${quote(cell)} is not a whole number from 1 to ${PRICE_LIST_LIMITS.maxPackQty}`);
    return null;
  }

  private gtin(): string | null {
    const cell = this.text('gtin');
    if (cell === '') return null;
    const checked = checkGtin(cell);
    if (checked.ok) return checked.gtin;
    this.fail('gtin', checked.reason);
    return null;
  }

  private specValues(): { coil?: Partial<CoilSpec>; plug?: Partial<PlugSpec> } {
    let coil: Record<string, unknown> | undefined;
    let plug: Record<string, unknown> | undefined;
    for (const spec of this.specs) {
      const cell = this.text(spec.field);
      if (cell === '') continue;
      const converted = spec.convert(cell);
      if (!converted.ok) {
        this.fail(spec.field, converted.reason);
        continue;
      }
      const checked = spec.schema.safeParse(converted.value);
      if (!checked.success) {
        const issue = checked.error.issues[0];
        this.fail(spec.field, `${quote(cell)} ${issue ? issueReason(issue) : 'is not valid'}`);
        continue;
      }
      const target = spec.family === 'coil' ? (coil ??= {}) : (plug ??= {});
      target[spec.field] = checked.data;
    }
    return { coil: coil as Partial<CoilSpec> | undefined, plug: plug as Partial<PlugSpec> | undefined };
  }

  /** The two ends of a resistance window, in the order the spec schema demands. */
  private checkWindow(min: number | null | undefined, max: number | null | undefined, field: 'primaryOhmMin' | 'secondaryKohmMin'): void {
    if (min != null && max != null && min > max) {
      this.fail(field, `the window's minimum ${min} is above its maximum ${max}`);
    }
  }
}

/** Validates one line against a resolved mapping. For many lines, reuse one RowValidator. */
export function validateRow(cells: readonly string[], mapping: ResolvedMapping, lineNumber: number, opts: RowOptions = {}): RowResult {
  return new RowValidator(mapping, opts).validate(cells, lineNumber);
}
