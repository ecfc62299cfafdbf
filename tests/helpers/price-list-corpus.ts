import iconv from 'iconv-lite';
import { BULK_BRAND, csv, dollars, gtin, STANDARD_HEADER, type Cell } from './price-list-files';

/**
 * Mutated supplier files for the robustness test: valid files in three layouts, then damaged
 * the ways real files are (random bytes, truncation, wrong delimiters, broken quotes, huge
 * fields, stray bytes, odd encodings and line ends). Deterministic from a seed.
 */

type Random = () => number;

const int = (random: Random, min: number, max: number): number => min + Math.floor(random() * (max - min + 1));
const pick = <T>(random: Random, items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;

function baseRows(tag: string): Cell[][] {
  return Array.from({ length: 25 }, (_, i) => {
    const cost = 900 + i * 37;
    const description =
      i % 5 === 0 ? `Canister coil, "heavy duty", ${i} kV` : i % 7 === 0 ? `Coil pack\nremanufactured` : `Ignition coil ${i}`;
    return [
      `CK-${tag}-${i}`,
      BULK_BRAND,
      description,
      dollars(cost),
      dollars(cost * 2 + 99),
      i % 6 === 0 ? '15.00' : '0.00',
      1,
      gtin(`2099${String(i).padStart(8, '0')}`),
      i === 3 ? `CK-${tag}-2` : null,
      'coil',
    ];
  });
}

/** The valid starting points: comma with LF, semicolon with CRLF and decimal commas, tab. */
export function baseFiles(tag: string): Buffer[] {
  const rows = baseRows(tag);
  const semicolon = rows.map((r) => r.map((c, i) => (typeof c === 'string' && i >= 3 && i <= 5 ? c.replace('.', ',') : c)));
  return [
    Buffer.from(csv([STANDARD_HEADER, ...rows])),
    Buffer.from(csv([STANDARD_HEADER, ...semicolon], { delimiter: ';', eol: '\r\n' })),
    Buffer.from(csv([STANDARD_HEADER, ...rows], { delimiter: '\t' })),
  ];
}

type Mutation = (random: Random, file: Buffer) => Buffer;

const text = (file: Buffer): string => file.toString('utf8');
const lines = (file: Buffer): string[] => text(file).split(/(?<=\n)/);

const MUTATIONS: Record<string, Mutation> = {
  randomBytes: (random) => Buffer.from(Array.from({ length: int(random, 0, 3000) }, () => int(random, 0, 255))),
  printableNoise: (random) =>
    Buffer.from(Array.from({ length: int(random, 1, 3000) }, () => String.fromCharCode(int(random, 32, 126))).join('')),
  truncate: (random, file) => file.subarray(0, int(random, 0, file.length)),
  wrongDelimiter: (random, file) => {
    const [from, to] = pick(random, [
      [',', ';'],
      [',', '\t'],
      [';', ','],
      ['\t', ','],
      [',', '|'],
    ] as const);
    return Buffer.from(
      random() < 0.5
        ? text(file).split(from).join(to)
        : lines(file)
            .map((l) => (random() < 0.3 ? l.split(from).join(to) : l))
            .join(''),
    );
  },
  strayQuotes: (random, file) => {
    const s = text(file).split('');
    for (let n = int(random, 1, 6); n > 0; n--) s.splice(int(random, 0, s.length), 0, '"');
    return Buffer.from(s.join(''));
  },
  noQuotes: (_random, file) => Buffer.from(text(file).replace(/"/g, '')),
  hugeField: (random, file) => {
    const s = text(file);
    const at = int(random, 0, s.length);
    const size = random() < 0.1 ? int(random, 1_000_001, 1_200_000) : int(random, 9_000, 300_000);
    return Buffer.from(s.slice(0, at) + pick(random, ['A', 'é', ' ', '0']).repeat(size) + s.slice(at));
  },
  flipBytes: (random, file) => {
    const out = Buffer.from(file);
    for (let n = int(random, 1, 30); n > 0 && out.length > 0; n--) out[int(random, 0, out.length - 1)] = int(random, 0, 255);
    return out;
  },
  duplicateLines: (random, file) => {
    const ls = lines(file);
    for (let n = int(random, 1, 5); n > 0 && ls.length > 1; n--)
      ls.splice(int(random, 1, ls.length), 0, ls[int(random, 1, ls.length - 1)] ?? '');
    return Buffer.from(ls.join(''));
  },
  shuffleLines: (random, file) => {
    const ls = lines(file);
    for (let i = ls.length - 1; i > 0; i--) {
      const j = int(random, 0, i);
      [ls[i], ls[j]] = [ls[j] ?? '', ls[i] ?? ''];
    }
    return Buffer.from(ls.join(''));
  },
  dropHeader: (_random, file) => Buffer.from(lines(file).slice(1).join('')),
  crOnly: (_random, file) => Buffer.from(text(file).replace(/\r?\n/g, '\r')),
  blankLines: (random, file) =>
    Buffer.from(
      lines(file)
        .map((l) => (random() < 0.3 ? `${l}\n\n` : l))
        .join(''),
    ),
  deleteChars: (random, file) => {
    const s = text(file).split('');
    for (let n = int(random, 1, 40); n > 0 && s.length > 0; n--) s.splice(int(random, 0, s.length - 1), 1);
    return Buffer.from(s.join(''));
  },
  nulByte: (random, file) => {
    const out = Buffer.from(file);
    if (out.length > 0) out[int(random, 0, out.length - 1)] = 0;
    return out;
  },
  utf16: (random, file) => {
    const body = iconv.encode(text(file), random() < 0.5 ? 'utf-16le' : 'utf-16be');
    return random() < 0.7 ? Buffer.concat([body[0] === 0 ? Buffer.from([0xfe, 0xff]) : Buffer.from([0xff, 0xfe]), body]) : body;
  },
  windows1252: (_random, file) => iconv.encode(text(file).replace(/Ignition/g, 'Zündspule'), 'windows-1252'),
  formulaCells: (random, file) =>
    Buffer.from(
      lines(file)
        .map((l, i) => (i > 0 && random() < 0.3 ? l.replace(/^[^,;\t]*/, pick(random, ['=1+2', '+SUM(A1)', '-3', '@cmd'])) : l))
        .join(''),
    ),
  extraColumns: (random, file) =>
    Buffer.from(
      lines(file)
        .map((l) => (random() < 0.4 ? l.replace(/(\r?\n)?$/, `,extra$1`) : l))
        .join(''),
    ),
};

export const MUTATION_NAMES = Object.keys(MUTATIONS);

/** One damaged file: a base file with one to three mutations applied, and their names. */
export function mutatedFile(random: Random, bases: readonly Buffer[]): { file: Buffer; how: string[] } {
  let file = pick(random, bases);
  const how: string[] = [];
  for (let n = int(random, 1, 3); n > 0; n--) {
    const name = pick(random, MUTATION_NAMES);
    how.push(name);
    file = (MUTATIONS[name] as Mutation)(random, file);
  }
  return { file, how };
}
