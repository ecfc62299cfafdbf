import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parse } from 'csv-parse/sync';
import { isValid as isValidGtin } from 'gtin';
import { describe, expect, it } from 'vitest';
import { compareCoils, comparePlugs } from '../../shared/compat';
import { normalizePartNumber } from '../../shared/part-number';
import {
  coilSpecSchema,
  engineSpecSchema,
  HEAT_STEP_MAX,
  HEAT_STEP_MIN,
  PART_KINDS,
  plugSpecSchema,
  type ResolvedPlugSpec,
} from '../../shared/schemas/specs';
import {
  alternates,
  brands,
  engines,
  fitments,
  foreignParts,
  gtin13,
  interchange,
  oeBrands,
  ourParts,
  parts,
  PRICE_EFFECTIVE_DATE,
  stock,
  locations,
  supersessions,
  supplierPrices,
  suppliers,
  vehicles,
  type CoilPartSeed,
  type PartSeed,
  type PlugPartSeed,
} from '../../seed/data';

const csvDir = fileURLToPath(new URL('../../seed/csv/', import.meta.url));
const readCsv = (name: string) => readFileSync(csvDir + name, 'utf8');

const partByNumber = new Map<string, PartSeed>(parts.map((p) => [p.partNumber, p]));
const ourNumbers = new Set(ourParts.map((p) => p.partNumber));
const ourByNormalised = new Map(ourParts.map((p) => [normalizePartNumber(p.partNumber), p]));

function brandHeatStep(brandName: string, code: string): number | undefined {
  return brands.find((b) => b.name === brandName)?.heatCodes.find((h) => h.code === code)?.heatStep;
}

describe('specs', () => {
  it('every engine spec parses and its values sit in the trade ranges', () => {
    for (const engine of engines) {
      const spec = engineSpecSchema.parse(engine);
      expect(spec.compressionRatio).toBeGreaterThanOrEqual(8.5);
      expect(spec.compressionRatio).toBeLessThanOrEqual(12.5);
      expect(spec.specGapMm).toBeGreaterThanOrEqual(0.7);
      expect(spec.specGapMm).toBeLessThanOrEqual(1.1);
      expect(spec.dwellMs).toBeGreaterThanOrEqual(2);
      expect(spec.dwellMs).toBeLessThanOrEqual(4);
      expect(spec.crankingDwellMs).toBeGreaterThanOrEqual(3);
      expect(spec.crankingDwellMs).toBeLessThanOrEqual(6);
      expect(spec.peakBoostKpa > 0).toBe(engine.aspiration !== 'natural');
      const externalDriver = engine.ignition === 'waste-spark-pack' || engine.ignition === 'distributor-canister';
      expect(spec.driverCurrentLimitA != null, engine.code).toBe(externalDriver);
    }
  });

  it('every coil and plug spec parses with its schema', () => {
    for (const part of parts) {
      const result = part.kind === 'coil' ? coilSpecSchema.safeParse(part.spec) : plugSpecSchema.safeParse(part.spec);
      expect(result.success, `${part.partNumber}: ${result.error?.message ?? ''}`).toBe(true);
    }
  });

  it('every plug heat code is in its brand table', () => {
    const plugs = parts.filter((p): p is PlugPartSeed => p.kind === 'plug');
    expect(plugs.length).toBeGreaterThan(0);
    for (const plug of plugs) {
      expect(brandHeatStep(plug.brand, plug.spec.heatCode), plug.partNumber).toBeDefined();
    }
  });
});

describe('counts and coverage', () => {
  it('has 30+ engines, 150+ vehicles, 3–4 brands and a few makes', () => {
    expect(engines.length).toBeGreaterThanOrEqual(30);
    expect(vehicles.length).toBeGreaterThanOrEqual(150);
    expect(brands.length).toBeGreaterThanOrEqual(3);
    expect(brands.length).toBeLessThanOrEqual(4);
    const makes = new Set(vehicles.map((v) => v.make));
    expect(makes.size).toBeGreaterThanOrEqual(4);
    expect(makes.size).toBeLessThanOrEqual(5);
  });

  it('covers every ignition case the demo needs', () => {
    const fittedPart = (engineCode: string, position: string) =>
      partByNumber.get(fitments.find((f) => f.engineCode === engineCode && f.position === position)?.partNumber ?? '');
    const coilOf = (code: string) => {
      const part = fittedPart(code, 'ignition coil');
      return part?.kind === 'coil' ? part.spec : undefined;
    };
    expect(engines.some((e) => coilOf(e.code)?.driver === 'integrated' && coilOf(e.code)?.architecture === 'coil-on-plug')).toBe(true);
    expect(engines.some((e) => coilOf(e.code)?.driver === 'external' && coilOf(e.code)?.architecture === 'coil-pack')).toBe(true);
    expect(engines.some((e) => e.ignition === 'distributor-canister' && coilOf(e.code)?.architecture === 'canister')).toBe(true);
    const boost = engines.filter((e) => e.aspiration === 'turbo').map((e) => e.peakBoostKpa);
    expect(Math.min(...boost)).toBeGreaterThanOrEqual(80);
    expect(Math.max(...boost)).toBeLessThanOrEqual(140);
    const fineWire = engines.filter((e) => {
      const plug = fittedPart(e.code, 'spark plug');
      return plug?.kind === 'plug' && plug.spec.electrode.startsWith('fine-wire');
    });
    expect(fineWire.map((e) => e.code)).toEqual(['SN15']);
  });

  it('every engine has exactly one fitted coil and one fitted plug of ours, in the right quantity', () => {
    for (const engine of engines) {
      const rows = fitments.filter((f) => f.engineCode === engine.code);
      const coil = rows.filter((f) => f.position === 'ignition coil');
      const plug = rows.filter((f) => f.position === 'spark plug');
      expect(coil, engine.code).toHaveLength(1);
      expect(plug, engine.code).toHaveLength(1);
      expect(partByNumber.get(coil[0]!.partNumber)?.kind).toBe('coil');
      expect(partByNumber.get(plug[0]!.partNumber)?.kind).toBe('plug');
      expect(ourNumbers.has(coil[0]!.partNumber) && ourNumbers.has(plug[0]!.partNumber)).toBe(true);
      expect(plug[0]!.quantity).toBe(engine.cylinders);
      const expectedCoils = { 'distributor-canister': 1, 'waste-spark-pack': engine.cylinders / 2 }[engine.ignition as string];
      expect(coil[0]!.quantity).toBe(expectedCoils ?? engine.cylinders);
      // The fitted plug is the engine's spec gap: comparing it with itself gives go on the gap row.
      const fittedPlug = partByNumber.get(plug[0]!.partNumber);
      expect(fittedPlug?.kind === 'plug' && fittedPlug.spec.gapMm).toBe(engine.specGapMm);
    }
    expect(fitments.every((f) => engines.some((e) => e.code === f.engineCode))).toBe(true);
  });

  it('vehicles are unique and all point at engines; every engine is in a vehicle', () => {
    const engineCodes = new Set(engines.map((e) => e.code));
    expect(vehicles.every((v) => engineCodes.has(v.engineCode) && v.year >= 2004 && v.year <= 2024)).toBe(true);
    const keys = vehicles.map((v) => `${v.year}|${v.make}|${v.model}|${v.trim}`);
    expect(new Set(keys).size).toBe(keys.length);
    const used = new Set(vehicles.map((v) => v.engineCode));
    expect([...engineCodes].filter((c) => !used.has(c))).toEqual([]);
  });
});

describe('brands', () => {
  it('heat tables map unique codes onto unique steps within the heat scale', () => {
    for (const brand of brands) {
      const codes = brand.heatCodes.map((h) => h.code);
      const steps = brand.heatCodes.map((h) => h.heatStep);
      expect(new Set(codes).size).toBe(codes.length);
      expect(new Set(steps).size).toBe(steps.length);
      expect(steps.every((s) => Number.isInteger(s) && s >= HEAT_STEP_MIN && s <= HEAT_STEP_MAX)).toBe(true);
      expect(brand.heatCodes.length > 0).toBe(brand.kinds.includes('plug'));
    }
  });

  it('has numbered heat codes running in opposite directions, and one lettered table', () => {
    const direction = (name: string) => {
      const table = brands.find((b) => b.name === name)?.heatCodes ?? [];
      const sorted = [...table].sort((a, b) => Number(a.code) - Number(b.code));
      return Math.sign(sorted.at(-1)!.heatStep - sorted[0]!.heatStep);
    };
    const numbered = brands.filter((b) => b.heatCodes.length > 0 && b.heatCodes.every((h) => /^\d+$/.test(h.code)));
    const directions = new Set(numbered.map((b) => direction(b.name)));
    expect(directions).toEqual(new Set([1, -1]));
    expect(brands.some((b) => b.heatCodes.some((h) => /^[A-Z]/.test(h.code)))).toBe(true);
  });

  it('marks our brands and leaves original-equipment brands out of the brand list', () => {
    expect(brands.some((b) => b.ours)).toBe(true);
    expect(brands.some((b) => !b.ours)).toBe(true);
    expect(ourParts.every((p) => brands.find((b) => b.name === p.brand)?.ours === true)).toBe(true);
    expect(foreignParts.every((p) => brands.find((b) => b.name === p.brand)?.ours === false)).toBe(true);
    expect(oeBrands.length).toBeGreaterThanOrEqual(1);
    expect(oeBrands.every((oe) => !brands.some((b) => b.name === oe.name))).toBe(true);
  });
});

describe('part numbers and GTINs', () => {
  it('has no two parts with the same normalised number', () => {
    const normalised = parts.map((p) => normalizePartNumber(p.partNumber));
    expect(new Set(normalised).size).toBe(normalised.length);
  });

  it('prints numbers with separators, so normalisation matters', () => {
    expect(parts.every((p) => normalizePartNumber(p.partNumber) !== p.partNumber)).toBe(true);
  });

  it('GTINs are 13 digits with a valid GS1 check digit, and unique', () => {
    for (const part of parts) {
      expect(part.gtin, part.partNumber).toMatch(/^\d{13}$/);
      expect(isValidGtin(part.gtin), part.partNumber).toBe(true);
    }
    expect(new Set(parts.map((p) => p.gtin)).size).toBe(parts.length);
  });

  it('gtin13 appends the GS1 check digit', () => {
    expect(gtin13('629104150021')).toBe('6291041500213');
    expect(() => gtin13('12345')).toThrow();
  });
});

describe('interchange', () => {
  it('every row points at our part and at a known foreign brand', () => {
    for (const row of interchange) {
      expect(ourNumbers.has(row.ourPartNumber), row.ourPartNumber).toBe(true);
      expect(row.confidence).toBeGreaterThanOrEqual(0);
      expect(row.confidence).toBeLessThanOrEqual(1);
      const brand = brands.find((b) => b.name === row.foreignBrand);
      if (brand) {
        expect(brand.ours).toBe(false);
        const original = partByNumber.get(row.foreignNumber);
        expect(original?.brand, row.foreignNumber).toBe(row.foreignBrand);
        expect(original?.kind).toBe(partByNumber.get(row.ourPartNumber)?.kind);
      } else {
        expect(
          oeBrands.some((oe) => oe.name === row.foreignBrand),
          row.foreignBrand,
        ).toBe(true);
      }
    }
    const keys = interchange.map((r) => `${r.foreignBrand}|${normalizePartNumber(r.foreignNumber)}|${r.ourPartNumber}`);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('has exactly one deliberately wrong row: same thread, a different reach', () => {
    const wrong = interchange.filter((r) => r.demoNote === 'wrong');
    expect(wrong).toHaveLength(1);
    const original = partByNumber.get(wrong[0]!.foreignNumber);
    const ours = partByNumber.get(wrong[0]!.ourPartNumber);
    if (original?.kind !== 'plug' || ours?.kind !== 'plug') throw new Error('the wrong row maps plugs');
    expect(ours.spec.threadMm).toBe(original.spec.threadMm);
    expect(ours.spec.seat).toBe(original.spec.seat);
    expect(Math.abs(ours.spec.reachMm - original.spec.reachMm)).toBeGreaterThan(0.3);
    // The same foreign number also has a right row, to a plug of the same reach.
    const right = interchange.filter((r) => r.foreignNumber === wrong[0]!.foreignNumber && r.demoNote !== 'wrong');
    const rightPlug = partByNumber.get(right[0]?.ourPartNumber ?? '');
    expect(rightPlug?.kind === 'plug' && rightPlug.spec.reachMm).toBe(original.spec.reachMm);
  });
});

describe('supersession', () => {
  it('is a three-part chain of ours ending at a current part', () => {
    expect(supersessions).toHaveLength(2);
    const next = new Map(supersessions.map((s) => [s.partNumber, s.supersededBy]));
    const start = supersessions.find((s) => !supersessions.some((t) => t.supersededBy === s.partNumber));
    const chain = [start!.partNumber];
    while (next.has(chain.at(-1)!)) chain.push(next.get(chain.at(-1)!)!);
    expect(chain).toHaveLength(3);
    const chainParts = chain.map((n) => ourParts.find((p) => p.partNumber === n));
    expect(chainParts.map((p) => p?.status)).toEqual(['discontinued', 'discontinued', 'active']);
    expect(new Set(chainParts.map((p) => p?.kind)).size).toBe(1);
  });
});

describe('stock, suppliers and prices', () => {
  it('stock rows name our parts, with bins, some at zero', () => {
    expect(stock.length).toBeGreaterThan(ourParts.length / 2);
    expect(stock.every((s) => ourNumbers.has(s.partNumber) && Number.isInteger(s.onHand) && s.onHand >= 0)).toBe(true);
    expect(stock.every((s) => /^[A-Z]-\d{2}-\d$/.test(s.bin))).toBe(true);
    expect(stock.some((s) => s.onHand === 0)).toBe(true);
    expect(new Set(stock.map((s) => `${s.location}|${s.partNumber}`)).size).toBe(stock.length);
    expect(new Set(stock.map((s) => s.location))).toEqual(new Set(locations.map((l) => l.name)));
  });

  it('two suppliers price our parts in whole cents', () => {
    expect(suppliers).toHaveLength(2);
    const keys = new Set(suppliers.map((s) => s.key));
    for (const price of supplierPrices) {
      expect(keys.has(price.supplierKey)).toBe(true);
      expect(ourNumbers.has(price.partNumber), price.partNumber).toBe(true);
      for (const cents of [price.costCents, price.listCents, price.coreChargeCents]) {
        expect(Number.isInteger(cents) && cents >= 0).toBe(true);
      }
      expect(price.costCents).toBeLessThan(price.listCents);
      expect(price.packQty).toBeGreaterThanOrEqual(1);
      expect(price.effectiveDate).toBe(PRICE_EFFECTIVE_DATE);
    }
    expect(supplierPrices.some((p) => p.coreChargeCents > 0)).toBe(true);
    const pairs = supplierPrices.map((p) => `${p.supplierKey}|${p.partNumber}`);
    expect(new Set(pairs).size).toBe(pairs.length);
    // Every part a clerk can sell today has a price.
    const priced = new Set(supplierPrices.map((p) => p.partNumber));
    expect(ourParts.filter((p) => p.status === 'active' && !priced.has(p.partNumber))).toEqual([]);
  });
});

describe('alternates', () => {
  it('name our parts against the engine’s fitted part and show every verdict', () => {
    for (const alt of alternates) {
      const fitted = fitments.find((f) => f.engineCode === alt.engineCode && f.partNumber === alt.fittedPartNumber);
      expect(fitted, `${alt.engineCode} ${alt.fittedPartNumber}`).toBeDefined();
      expect(ourNumbers.has(alt.partNumber)).toBe(true);
      expect(partByNumber.get(alt.partNumber)?.kind).toBe(partByNumber.get(alt.fittedPartNumber)?.kind);
      expect(alt.decidingCheck === null).toBe(alt.expectedVerdict === 'go');
    }
    expect(new Set(alternates.map((a) => a.expectedVerdict))).toEqual(new Set(['go', 'review', 'no-go']));
  });
});

describe('verdicts of the shared compatibility model on the scenario', () => {
  const fittedPart = (engineCode: string, position: string): PartSeed => {
    const fitment = fitments.find((f) => f.engineCode === engineCode && f.position === position);
    const part = partByNumber.get(fitment?.partNumber ?? '');
    if (!part) throw new Error(`no fitted ${position} for ${engineCode}`);
    return part;
  };
  const resolve = (plug: PlugPartSeed): ResolvedPlugSpec => {
    const heatStep = brandHeatStep(plug.brand, plug.spec.heatCode);
    if (heatStep === undefined) throw new Error(`no heat step for ${plug.partNumber}`);
    return { ...plug.spec, heatStep };
  };
  const compare = (original: PartSeed, substitute: PartSeed, engineCode: string) => {
    const engine = engines.find((e) => e.code === engineCode);
    if (!engine) throw new Error(`no engine ${engineCode}`);
    if (original.kind === 'coil' && substitute.kind === 'coil') {
      return compareCoils({ original: original.spec, substitute: substitute.spec, engine }, { curves: false });
    }
    if (original.kind === 'plug' && substitute.kind === 'plug') {
      const coil = fittedPart(engineCode, 'ignition coil') as CoilPartSeed;
      return comparePlugs({ original: resolve(original), substitute: resolve(substitute), engine, coil: coil.spec });
    }
    throw new Error(`${original.partNumber} and ${substitute.partNumber} are different kinds`);
  };

  it('every fitted part compared with itself is go', () => {
    for (const engine of engines) {
      for (const position of ['ignition coil', 'spark plug']) {
        const part = fittedPart(engine.code, position);
        const result = compare(part, part, engine.code);
        expect(result.verdict, `${engine.code} ${part.partNumber}`).toBe('go');
      }
    }
  });

  it('every alternate gets its expected verdict, set by its deciding check', () => {
    for (const alt of alternates) {
      const result = compare(partByNumber.get(alt.fittedPartNumber)!, partByNumber.get(alt.partNumber)!, alt.engineCode);
      const label = `${alt.engineCode} ${alt.fittedPartNumber} → ${alt.partNumber}`;
      expect(result.verdict, label).toBe(alt.expectedVerdict);
      if (alt.decidingCheck) {
        expect(result.checks.find((c) => c.id === alt.decidingCheck)?.verdict, label).toBe(alt.expectedVerdict);
      }
    }
  });

  it('judges every specified interchange row go, and the wrong one no-go on reach', () => {
    // Each foreign number is judged on the engine where its right equivalent is fitted.
    const engineFor = (foreignNumber: string) => {
      const right = interchange.filter((r) => r.foreignNumber === foreignNumber && r.demoNote !== 'wrong');
      return fitments.find((f) => right.some((r) => r.ourPartNumber === f.partNumber))?.engineCode;
    };
    const judged = interchange.filter((row) => partByNumber.has(row.foreignNumber));
    expect(judged.length).toBeGreaterThan(interchange.length / 2);
    for (const row of judged) {
      const engineCode = engineFor(row.foreignNumber);
      expect(engineCode, row.foreignNumber).toBeDefined();
      const result = compare(partByNumber.get(row.foreignNumber)!, partByNumber.get(row.ourPartNumber)!, engineCode!);
      const label = `${row.foreignNumber} → ${row.ourPartNumber}`;
      if (row.demoNote === 'wrong') {
        expect(result.verdict, label).toBe('no-go');
        expect(result.checks.filter((c) => c.verdict === 'no-go').map((c) => c.id)).toEqual(['reach']);
      } else {
        expect(result.verdict, label).toBe('go');
      }
    }
  });
});

// A fixture check, not the intake: it only says which rows of the sample files a correct intake rejects.
type Problem = { column: string; reason: string };
const PELLWORTH_HEADER = ['Part Number', 'Brand', 'Description', 'Cost', 'List', 'Core', 'Pack Qty', 'GTIN', 'Supersedes', 'Kind'];

function problemsOf(rows: Record<string, string>[], columns: { number: string; money: string[]; gtin: string; kind?: string }) {
  // A part on two lines is rejected on both: the file does not say which price is right.
  const lineCount = new Map<string, number>();
  for (const row of rows) {
    const number = normalizePartNumber(row[columns.number] ?? '');
    lineCount.set(number, (lineCount.get(number) ?? 0) + 1);
  }
  return rows.map((row) => {
    const problems: Problem[] = [];
    const number = normalizePartNumber(row[columns.number] ?? '');
    if (number === '') problems.push({ column: columns.number, reason: 'empty' });
    else if ((lineCount.get(number) ?? 0) > 1) problems.push({ column: columns.number, reason: 'duplicate' });
    for (const column of columns.money) {
      const value = Number(row[column]);
      if (!/^-?\d+(\.\d+)?$/.test(row[column] ?? '')) problems.push({ column, reason: 'not a number' });
      else if (value < 0) problems.push({ column, reason: 'negative' });
    }
    if (!isValidGtin(row[columns.gtin] ?? '')) problems.push({ column: columns.gtin, reason: 'gtin' });
    if (columns.kind && !(PART_KINDS as readonly string[]).includes(row[columns.kind] ?? '')) {
      problems.push({ column: columns.kind, reason: 'kind' });
    }
    return problems;
  });
}

const pellworthColumns = {
  number: 'Part Number',
  money: ['Cost', 'List', 'Core'],
  gtin: 'GTIN',
  kind: 'Kind',
};

describe('sample supplier CSVs', () => {
  it('all three files exist, with a README', () => {
    for (const name of ['supplier-a-clean.csv', 'supplier-b-other-layout.csv', 'supplier-a-bad-rows.csv', 'README.md']) {
      expect(existsSync(csvDir + name), name).toBe(true);
    }
  });

  it('the clean file is valid throughout, with changes, new numbers and one supersession', () => {
    const text = readCsv('supplier-a-clean.csv');
    expect(text.split('\n')[0]).toBe(PELLWORTH_HEADER.join(','));
    const rows = parse(text, { columns: true }) as Record<string, string>[];
    expect(rows.length).toBeGreaterThanOrEqual(35);
    expect(rows.length).toBeLessThanOrEqual(45);
    expect(problemsOf(rows, pellworthColumns).flat()).toEqual([]);
    const known = rows.filter((r) => ourByNormalised.has(normalizePartNumber(r['Part Number']!)));
    const fresh = rows.filter((r) => !ourByNormalised.has(normalizePartNumber(r['Part Number']!)));
    expect(fresh.length).toBeGreaterThanOrEqual(2);
    expect(known.some((r) => ourByNormalised.get(normalizePartNumber(r['Part Number']!))!.partNumber !== r['Part Number'])).toBe(true);
    const superseding = rows.filter((r) => r.Supersedes !== '');
    expect(superseding).toHaveLength(1);
    expect(ourByNormalised.has(normalizePartNumber(superseding[0]!.Supersedes!))).toBe(true);
    const moves = known.map((r) => {
      const part = ourByNormalised.get(normalizePartNumber(r['Part Number']!))!;
      const seed = supplierPrices.find((p) => p.supplierKey === 'pellworth' && p.partNumber === part.partNumber)!;
      expect(r.GTIN).toBe(part.gtin);
      return Math.abs(Math.round(Number(r.Cost) * 100) - seed.costCents) / seed.costCents;
    });
    expect(moves.filter((m) => m > 0.15)).toHaveLength(1);
    expect(moves.filter((m) => m > 0).length).toBeGreaterThan(1);
  });

  it('the other-layout file is semicolon-delimited with CRLF, quoted fields and an embedded line break', () => {
    const text = readCsv('supplier-b-other-layout.csv');
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.replace(/\r\n/g, '').includes('\r')).toBe(false);
    const rows = parse(text, { columns: true, delimiter: ';' }) as Record<string, string>[];
    expect(Object.keys(rows[0]!)).toEqual(['Mfr', 'Item No', 'Barcode', 'Desc', 'Qty/Pack', 'Net', 'Retail', 'Core Chg']);
    expect(rows.filter((r) => r.Desc!.includes('\n'))).toHaveLength(1);
    expect(
      problemsOf(rows, {
        number: 'Item No',
        money: ['Net', 'Retail', 'Core Chg'],
        gtin: 'Barcode',
      }).flat(),
    ).toEqual([]);
    for (const row of rows) {
      const part = ourByNormalised.get(normalizePartNumber(row['Item No']!));
      expect(part?.gtin, row['Item No']).toBe(row.Barcode);
    }
  });

  it('the bad-rows file rejects exactly the lines its README lists, one reason each', () => {
    const text = readCsv('supplier-a-bad-rows.csv');
    expect(text.split('\n')[0]).toBe(PELLWORTH_HEADER.join(','));
    const rows = parse(text, { columns: true }) as Record<string, string>[];
    const found = problemsOf(rows, pellworthColumns)
      .map((problems, i) => ({ line: i + 2, problems }))
      .filter((r) => r.problems.length > 0);
    expect(found.every((r) => r.problems.length === 1)).toBe(true);
    // A formula-looking description is kept as text (defused on intake, escaped on export), never a rejection.
    expect(rows[11]?.Description).toBe('=SUM(D2:D9)');
    const readme = readCsv('README.md');
    const table = readme.slice(readme.indexOf('supplier-a-bad-rows.csv'));
    const listed = [...table.matchAll(/^\| (\d+) \| ([^|]+?) \|/gm)].map((m) => ({
      line: Number(m[1]),
      column: m[2],
    }));
    expect(found.map((r) => ({ line: r.line, column: r.problems[0]!.column }))).toEqual(listed);
    expect(new Set(found.map((r) => r.problems[0]!.reason))).toEqual(
      new Set(['not a number', 'negative', 'gtin', 'kind', 'duplicate', 'empty']),
    );
  });
});
