import type { SupplierPriceSeed, SupplierSeed } from './types';

export const PELLWORTH = 'pellworth';
export const BRACKWATER = 'brackwater';
export const PRICE_EFFECTIVE_DATE = '2026-10-01';

export const suppliers: SupplierSeed[] = [
  {
    key: PELLWORTH,
    name: 'Pellworth Distribution',
    contactEmail: 'orders@pellworth.test',
    phone: '+1 555 0140',
  },
  {
    key: BRACKWATER,
    name: 'Brackwater Trade Supply',
    contactEmail: 'pricing@brackwater.test',
    phone: '+1 555 0187',
  },
];

/** Pellworth's prices, each: cost, list, core charge, pack. Brackwater's follow from these. */
const pellworth: [partNumber: string, cost: number, list: number, core: number, pack: number][] = [
  ['QW-IC 3101', 2450, 4999, 0, 1],
  ['QW-IC 3102', 3190, 6499, 0, 1],
  ['QW-IC 3104', 1890, 3799, 0, 1],
  ['QW-IC 3120', 2980, 5999, 0, 1],
  ['QW-IC 3121', 2190, 4399, 0, 1],
  ['QW-IC 3139', 2450, 4899, 0, 1],
  ['QW-IC 3140', 2590, 5299, 0, 1],
  ['QW-IC 3150', 3380, 6899, 0, 1],
  ['QW-IC 3160', 2690, 5499, 0, 1],
  ['QW-IC 3161', 3290, 6799, 0, 1],
  ['QW-IC 3170', 2350, 4799, 0, 1],
  ['QW-IC 3180', 2890, 5899, 0, 1],
  ['QW-IC 3181', 2490, 4999, 0, 1],
  ['QW-CP 5201', 3650, 7499, 0, 1],
  ['QW-CP 5205', 5290, 10999, 0, 1],
  ['QW-CP 5202', 3480, 6999, 0, 1],
  ['QW-CP 5203', 2290, 4599, 1500, 1],
  ['QW-CP 5204', 3390, 6799, 0, 1],
  ['QW-CN 7001', 1890, 3999, 0, 1],
  ['QW-CN 7002', 1690, 3499, 0, 1],
  ['QW-CN 7003', 2890, 5999, 0, 1],
  ['QW-SP 1406', 310, 749, 0, 4],
  ['QW-SP 1407', 310, 749, 0, 4],
  ['QW-SP 1404', 120, 349, 0, 10],
  ['QW-SP 1416', 120, 349, 0, 10],
  ['QW-SP 1446', 110, 329, 0, 10],
  ['QW-SP 1456', 330, 799, 0, 4],
  ['QW-SP 1411', 360, 849, 0, 4],
  ['QW-SP 1435', 135, 379, 0, 10],
  ['QW-SP 1208', 340, 799, 0, 4],
  ['QW-SP 1217', 520, 1199, 0, 4],
  ['QW-SP 1017', 540, 1249, 0, 4],
  ['QW-SP 1476T', 380, 899, 0, 4],
  ['QW-SP 1455T', 370, 879, 0, 4],
  ['QW-SP 1805', 150, 429, 0, 10],
  ['QW-SP 1805R', 160, 449, 0, 10],
  ['NR/IR 4406', 590, 1399, 0, 4],
  ['NR/IR 2208', 640, 1499, 0, 4],
  ['NR/IR 2209', 660, 1549, 0, 4],
  ['NR/IR 2207', 640, 1499, 0, 4],
  ['NR/FW 2217', 820, 1899, 0, 4],
  ['NR/IR 1018', 560, 1299, 0, 4],
];

/** Brackwater carries neither canisters nor the performance pack. */
const notAtBrackwater = new Set(['QW-CN 7001', 'QW-CN 7002', 'QW-CN 7003', 'QW-CP 5205']);

export const supplierPrices: SupplierPriceSeed[] = [
  ...pellworth.map(([partNumber, costCents, listCents, coreChargeCents, packQty]) => ({
    supplierKey: PELLWORTH,
    partNumber,
    costCents,
    listCents,
    coreChargeCents,
    packQty,
    effectiveDate: PRICE_EFFECTIVE_DATE,
  })),
  ...pellworth
    .filter(([partNumber]) => !notAtBrackwater.has(partNumber))
    .map(([partNumber, cost, listCents, coreChargeCents, packQty]) => ({
      supplierKey: BRACKWATER,
      partNumber,
      // Cheaper on plugs, dearer on coils; plugs come in fours only.
      costCents: Math.round(cost * (packQty > 1 ? 0.96 : 1.04)),
      listCents,
      coreChargeCents,
      packQty: packQty > 1 ? 4 : 1,
      effectiveDate: PRICE_EFFECTIVE_DATE,
    })),
];
