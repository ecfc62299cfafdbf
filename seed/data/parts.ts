import { gtinCheckDigit } from '../../shared/gtin';
import type { CoilSpec, PlugSpec } from '../../shared/schemas/specs';
import { brands, CALDER, NORROW, QUAYWELL, SPARROWFIELD } from './brands';
import type { CoilPartSeed, PartSeed, PartStatus, PlugPartSeed } from './types';

/**
 * A GTIN-13 from a 12-digit body. The bodies use the GS1 prefix range 200–299 (restricted
 * circulation), so no invented number can collide with a real product.
 */
export function gtin13(body: string): string {
  if (!/^\d{12}$/.test(body)) throw new Error(`GTIN body must be 12 digits: ${body}`);
  return `${body}${gtinCheckDigit(body)}`;
}

/** The brand's own code for a heat step; throws if the brand's table has none. */
function heatCodeFor(brandName: string, heatStep: number): string {
  const entry = brands.find((b) => b.name === brandName)?.heatCodes.find((h) => h.heatStep === heatStep);
  if (!entry) throw new Error(`${brandName} has no heat code for step ${heatStep}`);
  return entry.code;
}

const GTIN_PREFIX: Record<string, string> = {
  [QUAYWELL]: '2091450',
  [NORROW]: '2091460',
  [SPARROWFIELD]: '2093370',
  [CALDER]: '2093380',
};

interface PartArgs {
  brand: string;
  partNumber: string;
  /** Five-digit item reference inside the brand's GTIN prefix. */
  item: string;
  description: string;
  status?: PartStatus;
}

function coil(args: PartArgs, spec: CoilSpec): CoilPartSeed {
  return {
    kind: 'coil',
    brand: args.brand,
    partNumber: args.partNumber,
    description: args.description,
    gtin: gtin13(`${GTIN_PREFIX[args.brand] ?? ''}${args.item}`),
    status: args.status ?? 'active',
    spec,
  };
}

type PlugArgs = Omit<PlugSpec, 'heatCode'> & { heatStep: number };

function plug(args: PartArgs, { heatStep, ...spec }: PlugArgs): PlugPartSeed {
  return {
    kind: 'plug',
    brand: args.brand,
    partNumber: args.partNumber,
    description: args.description,
    gtin: gtin13(`${GTIN_PREFIX[args.brand] ?? ''}${args.item}`),
    status: args.status ?? 'active',
    spec: { ...spec, heatCode: heatCodeFor(args.brand, heatStep) },
  };
}

// Coil families. Integrated-igniter coils list no secondary window: the igniter sits in series.
const copIntegrated = {
  architecture: 'coil-on-plug',
  driver: 'integrated',
  outputs: 1,
  secondaryKohmMin: null,
  secondaryKohmMax: null,
} as const;
const pencilIntegrated = { ...copIntegrated, architecture: 'pencil' } as const;
const wasteSparkPack = { architecture: 'coil-pack', driver: 'external', outputs: 2 } as const;
const canister = {
  architecture: 'canister',
  driver: 'external',
  outputs: 1,
  connectorPins: 2,
  connectorKey: 'terminal posts',
} as const;

// Plug shells: thread, reach, seat, hex (mm).
const m14Flat19 = { threadMm: 14, threadPitchMm: 1.25, reachMm: 19, seat: 'flat', hexMm: 16 } as const;
const m14Flat12 = { ...m14Flat19, reachMm: 12.7 } as const;
const m12Flat26 = { threadMm: 12, threadPitchMm: 1.25, reachMm: 26.5, seat: 'flat', hexMm: 14 } as const;
const m10Flat19 = { threadMm: 10, threadPitchMm: 1, reachMm: 19, seat: 'flat', hexMm: 16 } as const;
const m14Taper11 = { threadMm: 14, threadPitchMm: 1.25, reachMm: 11.2, seat: 'taper', hexMm: 16 } as const;
const m14Taper17 = { ...m14Taper11, reachMm: 17.5 } as const;
const m18Taper11 = { threadMm: 18, threadPitchMm: 1.5, reachMm: 10.9, seat: 'taper', hexMm: 20.8 } as const;
const resistor5k = { resistor: true, resistorKohm: 5, projectedTip: true } as const;

const qw = (partNumber: string, item: string, description: string, status?: PartStatus): PartArgs => ({
  brand: QUAYWELL,
  partNumber,
  item,
  description,
  status,
});
const nr = (partNumber: string, item: string, description: string): PartArgs => ({
  brand: NORROW,
  partNumber,
  item,
  description,
});
const sf = (partNumber: string, item: string, description: string): PartArgs => ({
  brand: SPARROWFIELD,
  partNumber,
  item,
  description,
});
const cal = (partNumber: string, item: string, description: string): PartArgs => ({
  brand: CALDER,
  partNumber,
  item,
  description,
});

/** Our coils: Quaywell. */
export const ourCoils: CoilPartSeed[] = [
  coil(qw('QW-IC 3101', '03101', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin A'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'A',
    primaryOhmMin: 0.5,
    primaryOhmMax: 0.7,
    primaryInductanceMh: 3.4,
    turnsRatio: 90,
    availableKv: 36,
    peakCurrentA: 7.5,
  }),
  coil(qw('QW-IC 3102', '03102', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin A, high output'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'A',
    primaryOhmMin: 0.5,
    primaryOhmMax: 0.66,
    primaryInductanceMh: 3.6,
    turnsRatio: 95,
    availableKv: 40,
    peakCurrentA: 8,
  }),
  coil(qw('QW-IC 3104', '03104', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin A, economy'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'A',
    primaryOhmMin: 0.7,
    primaryOhmMax: 0.85,
    primaryInductanceMh: 3.1,
    turnsRatio: 82,
    availableKv: 33,
    peakCurrentA: 7.2,
  }),
  coil(qw('QW-IC 3120', '03120', 'Ignition coil, pencil, integrated igniter, 4-pin B'), {
    ...pencilIntegrated,
    connectorPins: 4,
    connectorKey: 'B',
    primaryOhmMin: 0.45,
    primaryOhmMax: 0.6,
    primaryInductanceMh: 3.0,
    turnsRatio: 100,
    availableKv: 44,
    peakCurrentA: 8.5,
  }),
  coil(qw('QW-IC 3121', '03121', 'Ignition coil, pencil, integrated igniter, 4-pin B, economy'), {
    ...pencilIntegrated,
    connectorPins: 4,
    connectorKey: 'B',
    primaryOhmMin: 0.55,
    primaryOhmMax: 0.75,
    primaryInductanceMh: 2.6,
    turnsRatio: 85,
    availableKv: 35,
    peakCurrentA: 7.5,
  }),
  // Supersession chain: 3138 → 3139 → 3140 (current).
  coil(qw('QW-IC 3138', '03138', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin C (superseded)', 'discontinued'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'C',
    primaryOhmMin: 0.6,
    primaryOhmMax: 0.8,
    primaryInductanceMh: 3.2,
    turnsRatio: 88,
    availableKv: 35,
    peakCurrentA: 7,
  }),
  coil(qw('QW-IC 3139', '03139', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin C (superseded)', 'discontinued'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'C',
    primaryOhmMin: 0.58,
    primaryOhmMax: 0.78,
    primaryInductanceMh: 3.3,
    turnsRatio: 90,
    availableKv: 36,
    peakCurrentA: 7.2,
  }),
  coil(qw('QW-IC 3140', '03140', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin C'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'C',
    primaryOhmMin: 0.55,
    primaryOhmMax: 0.75,
    primaryInductanceMh: 3.4,
    turnsRatio: 92,
    availableKv: 38,
    peakCurrentA: 7.5,
  }),
  coil(qw('QW-IC 3150', '03150', 'Ignition coil, pencil, integrated igniter, 4-pin D'), {
    ...pencilIntegrated,
    connectorPins: 4,
    connectorKey: 'D',
    primaryOhmMin: 0.4,
    primaryOhmMax: 0.55,
    primaryInductanceMh: 2.8,
    turnsRatio: 105,
    availableKv: 45,
    peakCurrentA: 9,
  }),
  coil(qw('QW-IC 3160', '03160', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin E'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'E',
    primaryOhmMin: 0.55,
    primaryOhmMax: 0.75,
    primaryInductanceMh: 3.8,
    turnsRatio: 90,
    availableKv: 38,
    peakCurrentA: 7.5,
  }),
  coil(qw('QW-IC 3161', '03161', 'Ignition coil, coil-on-plug, integrated igniter, 3-pin E, heavy duty'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'E',
    primaryOhmMin: 0.5,
    primaryOhmMax: 0.7,
    primaryInductanceMh: 4.2,
    turnsRatio: 95,
    availableKv: 40,
    peakCurrentA: 8,
  }),
  coil(qw('QW-IC 3170', '03170', 'Ignition coil, pencil, integrated igniter, 3-pin F'), {
    ...pencilIntegrated,
    connectorPins: 3,
    connectorKey: 'F',
    primaryOhmMin: 0.6,
    primaryOhmMax: 0.85,
    primaryInductanceMh: 2.8,
    turnsRatio: 85,
    availableKv: 34,
    peakCurrentA: 7,
  }),
  coil(qw('QW-IC 3180', '03180', 'Ignition coil, coil-on-plug, integrated igniter, 4-pin G'), {
    ...copIntegrated,
    connectorPins: 4,
    connectorKey: 'G',
    primaryOhmMin: 0.45,
    primaryOhmMax: 0.65,
    primaryInductanceMh: 3.6,
    turnsRatio: 100,
    availableKv: 40,
    peakCurrentA: 8,
  }),
  coil(qw('QW-IC 3181', '03181', 'Ignition coil, coil-on-plug, integrated igniter, 4-pin G, low ratio'), {
    ...copIntegrated,
    connectorPins: 4,
    connectorKey: 'G',
    primaryOhmMin: 0.45,
    primaryOhmMax: 0.65,
    primaryInductanceMh: 3.6,
    turnsRatio: 80,
    availableKv: 40,
    peakCurrentA: 8,
  }),
  coil(qw('QW-CP 5201', '05201', 'Ignition coil pack, waste spark, 2 towers, external driver, 2-pin H'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'H',
    primaryOhmMin: 0.55,
    primaryOhmMax: 0.75,
    primaryInductanceMh: 5.0,
    secondaryKohmMin: 8,
    secondaryKohmMax: 12,
    turnsRatio: 95,
    availableKv: 36,
    peakCurrentA: 8,
  }),
  coil(qw('QW-CP 5205', '05205', 'Ignition coil pack, waste spark, 2 towers, external driver, 2-pin H, performance'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'H',
    primaryOhmMin: 0.35,
    primaryOhmMax: 0.45,
    primaryInductanceMh: 3.6,
    secondaryKohmMin: 6,
    secondaryKohmMax: 8,
    turnsRatio: 110,
    availableKv: 42,
    peakCurrentA: 11,
  }),
  coil(qw('QW-CP 5202', '05202', 'Ignition coil pack, waste spark, 2 towers, external driver, 2-pin J'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'J',
    primaryOhmMin: 0.6,
    primaryOhmMax: 0.8,
    primaryInductanceMh: 5.5,
    secondaryKohmMin: 9,
    secondaryKohmMax: 13,
    turnsRatio: 90,
    availableKv: 34,
    peakCurrentA: 7.5,
  }),
  coil(qw('QW-CP 5203', '05203', 'Ignition coil pack, waste spark, 2 towers, external driver, 2-pin J, remanufactured'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'J',
    primaryOhmMin: 0.6,
    primaryOhmMax: 0.8,
    primaryInductanceMh: 5.5,
    secondaryKohmMin: 9,
    secondaryKohmMax: 13,
    turnsRatio: 90,
    availableKv: 34,
    peakCurrentA: 7.5,
  }),
  coil(qw('QW-CP 5204', '05204', 'Ignition coil pack, waste spark, 2 towers, external driver, 2-pin J, low resistance'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'J',
    primaryOhmMin: 0.5,
    primaryOhmMax: 0.7,
    primaryInductanceMh: 5.0,
    secondaryKohmMin: 8,
    secondaryKohmMax: 12,
    turnsRatio: 92,
    availableKv: 35,
    peakCurrentA: 8,
  }),
  coil(qw('QW-CN 7001', '07001', 'Ignition coil, canister, for distributor with ignition module'), {
    ...canister,
    primaryOhmMin: 1.3,
    primaryOhmMax: 1.7,
    primaryInductanceMh: 8.0,
    secondaryKohmMin: 8,
    secondaryKohmMax: 11,
    turnsRatio: 100,
    availableKv: 30,
    peakCurrentA: 5.5,
  }),
  coil(qw('QW-CN 7002', '07002', 'Ignition coil, canister, ballast-resistor type (needs external ballast)'), {
    ...canister,
    primaryOhmMin: 0.4,
    primaryOhmMax: 0.6,
    primaryInductanceMh: 6.5,
    secondaryKohmMin: 7,
    secondaryKohmMax: 10,
    turnsRatio: 100,
    availableKv: 32,
    peakCurrentA: 8,
  }),
  coil(qw('QW-CN 7003', '07003', 'Ignition coil, canister, high output, for distributor with ignition module'), {
    ...canister,
    primaryOhmMin: 1.1,
    primaryOhmMax: 1.4,
    primaryInductanceMh: 7.5,
    secondaryKohmMin: 9,
    secondaryKohmMax: 12,
    turnsRatio: 110,
    availableKv: 36,
    peakCurrentA: 6.5,
  }),
];

/** Our plugs: Quaywell (numbered heat codes) and Norrow (lettered heat codes). */
export const ourPlugs: PlugPartSeed[] = [
  plug(qw('QW-SP 1406', '01406', 'Spark plug M14×1.25, 19 mm reach, flat seat, platinum'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1407', '01407', 'Spark plug M14×1.25, 19 mm reach, flat seat, platinum, one step colder'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'platinum',
    heatStep: 7,
  }),
  plug(qw('QW-SP 1404', '01404', 'Spark plug M14×1.25, 19 mm reach, flat seat, copper, hot'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'copper',
    heatStep: 4,
  }),
  plug(qw('QW-SP 1416', '01416', 'Spark plug M14×1.25, 19 mm reach, flat seat, copper, 0.8 mm gap'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 0.8,
    regappable: true,
    electrode: 'copper',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1446', '01446', 'Spark plug M14×1.25, 19 mm reach, flat seat, copper, non-resistor'), {
    ...m14Flat19,
    resistor: false,
    resistorKohm: null,
    projectedTip: true,
    gapMm: 1.0,
    regappable: true,
    electrode: 'copper',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1456', '01456', 'Spark plug M14×1.25, 19 mm reach, flat seat, platinum, 20.8 mm hex'), {
    ...m14Flat19,
    ...resistor5k,
    hexMm: 20.8,
    gapMm: 1.0,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1411', '01411', 'Spark plug M14×1.25, 19 mm reach, flat seat, double platinum, 1.1 mm gap'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1435', '01435', 'Spark plug M14×1.25, 12.7 mm reach, flat seat, copper'), {
    ...m14Flat12,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'copper',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1208', '01208', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, platinum, 0.7 mm gap'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: true,
    electrode: 'platinum',
    heatStep: 8,
  }),
  plug(qw('QW-SP 1217', '01217', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, iridium, 0.9 mm gap'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.9,
    regappable: true,
    electrode: 'iridium',
    heatStep: 7,
  }),
  plug(qw('QW-SP 1017', '01017', 'Spark plug M10×1, 19 mm reach, flat seat, iridium'), {
    ...m10Flat19,
    ...resistor5k,
    gapMm: 0.8,
    regappable: true,
    electrode: 'iridium',
    heatStep: 7,
  }),
  plug(qw('QW-SP 1476T', '01476', 'Spark plug M14×1.25, 17.5 mm reach, taper seat, platinum'), {
    ...m14Taper17,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(qw('QW-SP 1455T', '01455', 'Spark plug M14×1.25, 11.2 mm reach, taper seat, platinum'), {
    ...m14Taper11,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 5,
  }),
  plug(qw('QW-SP 1805', '01805', 'Spark plug M18×1.5, 10.9 mm reach, taper seat, copper, non-resistor'), {
    ...m18Taper11,
    resistor: false,
    resistorKohm: null,
    projectedTip: false,
    gapMm: 0.9,
    regappable: true,
    electrode: 'copper',
    heatStep: 5,
  }),
  plug(qw('QW-SP 1805R', '01815', 'Spark plug M18×1.5, 10.9 mm reach, taper seat, copper, resistor'), {
    ...m18Taper11,
    resistor: true,
    resistorKohm: 5,
    projectedTip: false,
    gapMm: 0.9,
    regappable: true,
    electrode: 'copper',
    heatStep: 5,
  }),
  plug(nr('NR/IR 4406', '04406', 'Spark plug M14×1.25, 19 mm reach, flat seat, iridium'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.0,
    regappable: false,
    electrode: 'iridium',
    heatStep: 6,
  }),
  plug(nr('NR/IR 2208', '02208', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, iridium, for boost'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: false,
    electrode: 'iridium',
    heatStep: 8,
  }),
  plug(nr('NR/IR 2209', '02209', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, iridium, for high boost'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: false,
    electrode: 'iridium',
    heatStep: 9,
  }),
  plug(nr('NR/IR 2207', '02207', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, iridium, 0.7 mm gap'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: false,
    electrode: 'iridium',
    heatStep: 7,
  }),
  plug(nr('NR/FW 2217', '02217', 'Spark plug M12×1.25, 26.5 mm reach, flat seat, fine-wire iridium'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.8,
    regappable: false,
    electrode: 'fine-wire-iridium',
    heatStep: 7,
  }),
  plug(nr('NR/IR 1018', '01018', 'Spark plug M10×1, 19 mm reach, flat seat, iridium, one step colder'), {
    ...m10Flat19,
    ...resistor5k,
    gapMm: 0.8,
    regappable: false,
    electrode: 'iridium',
    heatStep: 8,
  }),
];

/**
 * Other brands' parts, specified so the verdict can judge an interchange row against the
 * original. They have no stock, price or fitment of the store's.
 */
export const foreignParts: PartSeed[] = [
  coil(sf('SPF 61.101', '61101', 'Coil-on-plug coil, integrated igniter, 3-pin A'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'A',
    primaryOhmMin: 0.52,
    primaryOhmMax: 0.68,
    primaryInductanceMh: 3.4,
    turnsRatio: 90,
    availableKv: 36,
    peakCurrentA: 7.5,
  }),
  coil(sf('SPF 61.120', '61120', 'Pencil coil, integrated igniter, 4-pin B'), {
    ...pencilIntegrated,
    connectorPins: 4,
    connectorKey: 'B',
    primaryOhmMin: 0.46,
    primaryOhmMax: 0.6,
    primaryInductanceMh: 3.0,
    turnsRatio: 100,
    availableKv: 41,
    peakCurrentA: 8.5,
  }),
  coil(sf('SPF 61.160', '61160', 'Coil-on-plug coil, integrated igniter, 3-pin E'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'E',
    primaryOhmMin: 0.55,
    primaryOhmMax: 0.72,
    primaryInductanceMh: 3.8,
    turnsRatio: 90,
    availableKv: 37,
    peakCurrentA: 7.5,
  }),
  coil(sf('SPF 63.202', '63202', 'Waste-spark coil pack, 2 towers, 2-pin J'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'J',
    primaryOhmMin: 0.62,
    primaryOhmMax: 0.8,
    primaryInductanceMh: 5.5,
    secondaryKohmMin: 9.5,
    secondaryKohmMax: 13,
    turnsRatio: 90,
    availableKv: 34,
    peakCurrentA: 7.5,
  }),
  coil(cal('CAL-88 140', '88140', 'COP coil with igniter, 3-pin C'), {
    ...copIntegrated,
    connectorPins: 3,
    connectorKey: 'C',
    primaryOhmMin: 0.56,
    primaryOhmMax: 0.74,
    primaryInductanceMh: 3.4,
    turnsRatio: 92,
    availableKv: 37,
    peakCurrentA: 7.5,
  }),
  coil(cal('CAL-88 150', '88150', 'Pencil coil with igniter, 4-pin D'), {
    ...pencilIntegrated,
    connectorPins: 4,
    connectorKey: 'D',
    primaryOhmMin: 0.42,
    primaryOhmMax: 0.55,
    primaryInductanceMh: 2.8,
    turnsRatio: 105,
    availableKv: 43,
    peakCurrentA: 9,
  }),
  coil(cal('CAL-88 170', '88170', 'Pencil coil with igniter, 3-pin F'), {
    ...pencilIntegrated,
    connectorPins: 3,
    connectorKey: 'F',
    primaryOhmMin: 0.62,
    primaryOhmMax: 0.84,
    primaryInductanceMh: 2.8,
    turnsRatio: 85,
    availableKv: 34,
    peakCurrentA: 7,
  }),
  coil(cal('CAL-88 180', '88180', 'COP coil with igniter, 4-pin G'), {
    ...copIntegrated,
    connectorPins: 4,
    connectorKey: 'G',
    primaryOhmMin: 0.46,
    primaryOhmMax: 0.64,
    primaryInductanceMh: 3.6,
    turnsRatio: 100,
    availableKv: 40,
    peakCurrentA: 8,
  }),
  coil(cal('CAL-90 201', '90201', 'Waste-spark coil pack, 2 towers, 2-pin H'), {
    ...wasteSparkPack,
    connectorPins: 2,
    connectorKey: 'H',
    primaryOhmMin: 0.56,
    primaryOhmMax: 0.74,
    primaryInductanceMh: 5.0,
    secondaryKohmMin: 8,
    secondaryKohmMax: 12,
    turnsRatio: 95,
    availableKv: 35,
    peakCurrentA: 8,
  }),
  coil(cal('CAL-95 001', '95001', 'Canister coil for distributor ignition'), {
    ...canister,
    primaryOhmMin: 1.3,
    primaryOhmMax: 1.7,
    primaryInductanceMh: 8.0,
    secondaryKohmMin: 8.5,
    secondaryKohmMax: 11,
    turnsRatio: 100,
    availableKv: 30,
    peakCurrentA: 5.5,
  }),
  plug(sf('SPF 52.146', '52146', 'Plug M14×1.25, 19 mm, flat, platinum'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(sf('SPF 52.111', '52111', 'Plug M14×1.25, 19 mm, flat, platinum, 1.1 mm'), {
    ...m14Flat19,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(sf('SPF 52.135', '52135', 'Plug M14×1.25, 12.7 mm short reach, flat, copper'), {
    ...m14Flat12,
    ...resistor5k,
    gapMm: 1.0,
    regappable: true,
    electrode: 'copper',
    heatStep: 6,
  }),
  plug(sf('SPF 52.228', '52228', 'Plug M12×1.25, 26.5 mm, flat, iridium, 0.7 mm'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: false,
    electrode: 'iridium',
    heatStep: 8,
  }),
  plug(sf('SPF 52.229', '52229', 'Plug M12×1.25, 26.5 mm, flat, iridium, 0.7 mm, cold'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.7,
    regappable: false,
    electrode: 'iridium',
    heatStep: 9,
  }),
  plug(sf('SPF 52.217', '52217', 'Plug M12×1.25, 26.5 mm, flat, iridium, 0.9 mm'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.9,
    regappable: true,
    electrode: 'iridium',
    heatStep: 7,
  }),
  plug(sf('SPF 52.281', '52281', 'Plug M12×1.25, 26.5 mm, flat, fine-wire platinum, 0.8 mm'), {
    ...m12Flat26,
    ...resistor5k,
    gapMm: 0.8,
    regappable: false,
    electrode: 'fine-wire-platinum',
    heatStep: 7,
  }),
  plug(sf('SPF 52.017', '52017', 'Plug M10×1, 19 mm, flat, iridium'), {
    ...m10Flat19,
    ...resistor5k,
    gapMm: 0.8,
    regappable: true,
    electrode: 'iridium',
    heatStep: 7,
  }),
  plug(sf('SPF 52.476', '52476', 'Plug M14×1.25, 17.5 mm, taper, platinum'), {
    ...m14Taper17,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 6,
  }),
  plug(sf('SPF 52.455', '52455', 'Plug M14×1.25, 11.2 mm, taper, platinum'), {
    ...m14Taper11,
    ...resistor5k,
    gapMm: 1.1,
    regappable: true,
    electrode: 'platinum',
    heatStep: 5,
  }),
  plug(sf('SPF 52.805', '52805', 'Plug M18×1.5, 10.9 mm, taper, copper'), {
    ...m18Taper11,
    resistor: false,
    resistorKohm: null,
    projectedTip: false,
    gapMm: 0.9,
    regappable: true,
    electrode: 'copper',
    heatStep: 5,
  }),
];

export const ourParts: PartSeed[] = [...ourCoils, ...ourPlugs];
export const parts: PartSeed[] = [...ourParts, ...foreignParts];
