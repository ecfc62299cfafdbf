import { EASTGATE, MILLBROOK, QUAYSIDE } from './locations';
import type { StockSeed } from './types';

/**
 * The first store's shelves. Aisle A holds coils, aisle B plugs; bins read aisle-bay-shelf, the same
 * layout in every store of the chain. Parts with no row are not stocked.
 */
const onHand: [partNumber: string, onHand: number, bin: string][] = [
  ['QW-IC 3101', 14, 'A-01-1'],
  ['QW-IC 3102', 6, 'A-01-2'],
  ['QW-IC 3104', 9, 'A-01-3'],
  ['QW-IC 3120', 11, 'A-02-1'],
  ['QW-IC 3121', 4, 'A-02-2'],
  ['QW-IC 3138', 0, 'A-03-1'],
  ['QW-IC 3139', 2, 'A-03-1'],
  ['QW-IC 3140', 12, 'A-03-2'],
  ['QW-IC 3150', 5, 'A-04-1'],
  ['QW-IC 3160', 16, 'A-05-1'],
  ['QW-IC 3161', 3, 'A-05-2'],
  ['QW-IC 3170', 8, 'A-06-1'],
  ['QW-IC 3180', 10, 'A-07-1'],
  ['QW-IC 3181', 0, 'A-07-2'],
  ['QW-CP 5201', 4, 'A-10-1'],
  ['QW-CP 5205', 0, 'A-10-2'],
  ['QW-CP 5202', 6, 'A-11-1'],
  ['QW-CP 5203', 3, 'A-11-2'],
  ['QW-CP 5204', 2, 'A-11-3'],
  ['QW-CN 7001', 3, 'A-12-3'],
  ['QW-CN 7002', 0, 'A-12-4'],
  ['QW-SP 1406', 64, 'B-01-1'],
  ['QW-SP 1407', 24, 'B-01-2'],
  ['QW-SP 1404', 0, 'B-01-3'],
  ['QW-SP 1416', 40, 'B-01-4'],
  ['QW-SP 1446', 20, 'B-02-1'],
  ['QW-SP 1456', 8, 'B-02-2'],
  ['QW-SP 1411', 36, 'B-02-3'],
  ['QW-SP 1435', 16, 'B-03-1'],
  ['QW-SP 1208', 24, 'B-04-1'],
  ['QW-SP 1217', 32, 'B-04-2'],
  ['QW-SP 1017', 20, 'B-05-1'],
  ['QW-SP 1476T', 32, 'B-06-1'],
  ['QW-SP 1455T', 0, 'B-06-2'],
  ['QW-SP 1805', 12, 'B-07-1'],
  ['QW-SP 1805R', 6, 'B-07-2'],
  ['NR/IR 4406', 28, 'B-10-1'],
  ['NR/IR 2208', 48, 'B-11-1'],
  ['NR/IR 2209', 12, 'B-11-2'],
  ['NR/IR 2207', 0, 'B-11-3'],
  ['NR/FW 2217', 16, 'B-12-1'],
];

/**
 * The other two stores hold less, and differently: the counts are made up from the first store's so
 * they differ part by part. A few are set outright for the demo: the fitted plug of the OD57 engine
 * (QW-SP 1455T) is out at Quayside and 3 are at Eastgate, so the counter shows "0 here · 3 at …".
 */
const otherStores: Record<string, [eastgate: number, millbrook: number]> = {
  'QW-SP 1455T': [3, 0],
  'QW-IC 3138': [2, 1],
  'QW-IC 3101': [6, 2],
  'QW-SP 1406': [20, 12],
};

export const stock: StockSeed[] = onHand.flatMap(([partNumber, qty, bin]) => {
  const [eastgate, millbrook] = otherStores[partNumber] ?? [(qty * 5 + 3) % 11, qty % 3 === 0 ? 0 : Math.ceil(qty / 3)];
  return [
    { location: QUAYSIDE, partNumber, onHand: qty, bin },
    { location: EASTGATE, partNumber, onHand: eastgate, bin },
    { location: MILLBROOK, partNumber, onHand: millbrook, bin },
  ];
});
