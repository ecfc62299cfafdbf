/**
 * What a clerk types at the counter, judged on the invented demo scenario (`seed/data/`): for each
 * query the parts a clerk expects on top (any of them counts as the right answer). Read by the
 * relevance test (each query's expected part in the first three) and by `npm run bench` (the mean
 * reciprocal rank). The judgement is the trade's: a number leads to that part, or to our
 * equivalent through interchange, or to the current part along supersession (common practice);
 * words describe the part as a clerk would say it.
 */
export interface JudgedQuery {
  q: string;
  /** Our part numbers, as printed; the first one found in the hits is the right answer. */
  expect: readonly string[];
  kind: 'number' | 'interchange' | 'supersession' | 'gtin' | 'typo' | 'words' | 'vehicle';
}

export const JUDGED_QUERIES: readonly JudgedQuery[] = [
  // Our own numbers, as printed and as customers say them.
  { q: 'QW-IC 3140', expect: ['QW-IC 3140'], kind: 'number' },
  { q: 'qwic3140', expect: ['QW-IC 3140'], kind: 'number' },
  { q: 'qw ic 3101', expect: ['QW-IC 3101'], kind: 'number' },
  { q: 'QW-SP 1455T', expect: ['QW-SP 1455T'], kind: 'number' },
  { q: 'qwsp1805r', expect: ['QW-SP 1805R'], kind: 'number' },
  { q: 'NR/IR 2208', expect: ['NR/IR 2208'], kind: 'number' },
  { q: 'nr ir 4406', expect: ['NR/IR 4406'], kind: 'number' },
  { q: 'QW-CN 7002', expect: ['QW-CN 7002'], kind: 'number' },
  // Superseded numbers lead to the current part.
  { q: 'QW-IC 3138', expect: ['QW-IC 3140'], kind: 'supersession' },
  { q: 'qw-ic-3139', expect: ['QW-IC 3140'], kind: 'supersession' },
  // Other brands' numbers lead to ours through interchange.
  { q: 'CAL-88 140', expect: ['QW-IC 3140'], kind: 'interchange' },
  { q: 'cal88150', expect: ['QW-IC 3150'], kind: 'interchange' },
  { q: 'SPF 52.017', expect: ['QW-SP 1017'], kind: 'interchange' },
  { q: 'spf 52 111', expect: ['QW-SP 1411'], kind: 'interchange' },
  { q: 'TA 40-1138', expect: ['QW-IC 3140'], kind: 'interchange' },
  { q: 'OSP-7741-805', expect: ['QW-SP 1805'], kind: 'interchange' },
  { q: 'TA 71-0614', expect: ['QW-SP 1406'], kind: 'interchange' },
  { q: 'SPF 63.202', expect: ['QW-CP 5202', 'QW-CP 5203'], kind: 'interchange' },
  { q: 'osp77301 60', expect: ['QW-IC 3160'], kind: 'interchange' },
  // Scanned barcodes (GTIN-13).
  { q: '2091450031407', expect: ['QW-IC 3140'], kind: 'gtin' },
  { q: '2091460022082', expect: ['NR/IR 2208'], kind: 'gtin' },
  // One typo in a number: a swapped pair, a wrong character, a missing one.
  { q: 'QW-IC 3410', expect: ['QW-IC 3140'], kind: 'typo' },
  { q: 'QW-CN 7010', expect: ['QW-CN 7001'], kind: 'typo' },
  { q: 'QWCP52O1', expect: ['QW-CP 5201'], kind: 'typo' },
  { q: 'NR/IR 2280', expect: ['NR/IR 2208'], kind: 'typo' },
  { q: 'CAL-88 108', expect: ['QW-IC 3180'], kind: 'typo' },
  { q: 'QW-SP 147T', expect: ['QW-SP 1476T'], kind: 'typo' },
  // Words, as a clerk says them.
  { q: '4 pin coil', expect: ['QW-IC 3120', 'QW-IC 3121', 'QW-IC 3150', 'QW-IC 3180', 'QW-IC 3181'], kind: 'words' },
  {
    q: 'plug 14 mm 19 reach',
    expect: ['QW-SP 1406', 'QW-SP 1407', 'QW-SP 1411', 'QW-SP 1416', 'QW-SP 1446', 'QW-SP 1456', 'QW-SP 1404', 'NR/IR 4406'],
    kind: 'words',
  },
  { q: 'canister coil', expect: ['QW-CN 7001', 'QW-CN 7002', 'QW-CN 7003'], kind: 'words' },
  { q: 'waste spark coil pack', expect: ['QW-CP 5201', 'QW-CP 5202', 'QW-CP 5203', 'QW-CP 5204', 'QW-CP 5205'], kind: 'words' },
  { q: 'pencil coil', expect: ['QW-IC 3120', 'QW-IC 3121', 'QW-IC 3150', 'QW-IC 3170'], kind: 'words' },
  { q: 'taper seat plug', expect: ['QW-SP 1455T', 'QW-SP 1476T', 'QW-SP 1805', 'QW-SP 1805R'], kind: 'words' },
  { q: 'fine-wire iridium', expect: ['NR/FW 2217'], kind: 'words' },
  { q: 'ballast resistor coil', expect: ['QW-CN 7002'], kind: 'words' },
  { q: 'non-resistor plug', expect: ['QW-SP 1446', 'QW-SP 1805'], kind: 'words' },
  { q: 'double platinum', expect: ['QW-SP 1411'], kind: 'words' },
  { q: 'plug for high boost', expect: ['NR/IR 2209'], kind: 'words' },
  { q: '12.7 mm reach', expect: ['QW-SP 1435'], kind: 'words' },
  { q: 'remanufactured coil pack', expect: ['QW-CP 5203'], kind: 'words' },
  { q: '3-pin E coil', expect: ['QW-IC 3160', 'QW-IC 3161'], kind: 'words' },
  // Words with a typo.
  { q: 'canistr coil', expect: ['QW-CN 7001', 'QW-CN 7002', 'QW-CN 7003'], kind: 'words' },
  { q: 'pensil coil', expect: ['QW-IC 3120', 'QW-IC 3121', 'QW-IC 3150', 'QW-IC 3170'], kind: 'words' },
  // Vehicle words: make, model, engine code — the parts fitted to them.
  { q: 'Solenne Marivo', expect: ['QW-IC 3140', 'QW-SP 1217', 'NR/FW 2217'], kind: 'vehicle' },
  { q: 'Varrick Pennon coil', expect: ['QW-IC 3101', 'QW-CP 5201', 'QW-IC 3120'], kind: 'vehicle' },
  { q: 'Kaymor Nimbo plug', expect: ['QW-SP 1217', 'NR/IR 2208', 'QW-SP 1435'], kind: 'vehicle' },
  { q: 'OD40', expect: ['QW-CN 7001', 'QW-SP 1805'], kind: 'vehicle' },
  { q: 'TV23T', expect: ['QW-IC 3180', 'NR/IR 2209'], kind: 'vehicle' },
  { q: 'Odrin Fennet plug', expect: ['QW-SP 1406', 'QW-SP 1411'], kind: 'vehicle' },
  { q: 'Varick Halvard', expect: ['QW-IC 3120', 'QW-IC 3101', 'NR/IR 2208', 'QW-SP 1406'], kind: 'vehicle' },
];

/** 1 / the rank of the first expected part in the hits (1-based); 0 when none is there. */
export function reciprocalRank(hits: readonly string[], expected: readonly string[]): number {
  const rank = hits.findIndex((h) => expected.includes(h));
  return rank < 0 ? 0 : 1 / (rank + 1);
}
