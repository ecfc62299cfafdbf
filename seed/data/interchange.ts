import { CALDER, ODRIN_OE, SPARROWFIELD, TESSEL_OE } from './brands';
import type { InterchangeSeed } from './types';

/**
 * Foreign numbers and the part of ours that replaces each. Rows from other brands name parts in
 * `foreignParts` (so the verdict can judge them on their specs); original-equipment rows carry
 * only the number.
 */
export const interchange: InterchangeSeed[] = [
  // Sparrowfield, from the supplier's list and the brand's catalog
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 61.101', ourPartNumber: 'QW-IC 3101', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 61.120', ourPartNumber: 'QW-IC 3120', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 61.160', ourPartNumber: 'QW-IC 3160', source: 'brand catalog', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 63.202', ourPartNumber: 'QW-CP 5202', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 63.202', ourPartNumber: 'QW-CP 5203', source: 'manual', confidence: 0.85 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.146', ourPartNumber: 'QW-SP 1406', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.146', ourPartNumber: 'NR/IR 4406', source: 'brand catalog', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.111', ourPartNumber: 'QW-SP 1411', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.135', ourPartNumber: 'QW-SP 1435', source: 'manual', confidence: 0.9 },
  /*
   * The deliberately wrong row. SPF 52.135 is a 12.7 mm (short) reach plug; QW-SP 1406 has the
   * same M14×1.25 thread, flat seat, hex, heat step and gap but a 19 mm reach. Fitted in a
   * 12.7 mm head it would stand 6.3 mm into the chamber, where the piston or a valve can hit it.
   * The reach check (±0.3 mm) must make it no-go. It looks like a stale supplier-list row that
   * matched on thread and heat range only.
   */
  {
    foreignBrand: SPARROWFIELD,
    foreignNumber: 'SPF 52.135',
    ourPartNumber: 'QW-SP 1406',
    source: 'supplier list',
    confidence: 0.8,
    demoNote: 'wrong',
  },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.228', ourPartNumber: 'NR/IR 2208', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.228', ourPartNumber: 'QW-SP 1208', source: 'manual', confidence: 0.85 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.229', ourPartNumber: 'NR/IR 2209', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.217', ourPartNumber: 'QW-SP 1217', source: 'brand catalog', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.281', ourPartNumber: 'NR/FW 2217', source: 'brand catalog', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.017', ourPartNumber: 'QW-SP 1017', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.476', ourPartNumber: 'QW-SP 1476T', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.455', ourPartNumber: 'QW-SP 1455T', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.805', ourPartNumber: 'QW-SP 1805', source: 'manual', confidence: 0.85 },
  { foreignBrand: SPARROWFIELD, foreignNumber: 'SPF 52.805', ourPartNumber: 'QW-SP 1805R', source: 'manual', confidence: 0.75 },
  // Calder Ignition
  { foreignBrand: CALDER, foreignNumber: 'CAL-88 140', ourPartNumber: 'QW-IC 3140', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: CALDER, foreignNumber: 'CAL-88 150', ourPartNumber: 'QW-IC 3150', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: CALDER, foreignNumber: 'CAL-88 170', ourPartNumber: 'QW-IC 3170', source: 'brand catalog', confidence: 0.9 },
  { foreignBrand: CALDER, foreignNumber: 'CAL-88 180', ourPartNumber: 'QW-IC 3180', source: 'supplier list', confidence: 0.95 },
  { foreignBrand: CALDER, foreignNumber: 'CAL-90 201', ourPartNumber: 'QW-CP 5201', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: CALDER, foreignNumber: 'CAL-95 001', ourPartNumber: 'QW-CN 7001', source: 'manual', confidence: 0.85 },
  // Original equipment: numbers only
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 40-1101', ourPartNumber: 'QW-IC 3101', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 40-1120', ourPartNumber: 'QW-IC 3120', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 40-1170', ourPartNumber: 'QW-IC 3170', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 40-1180', ourPartNumber: 'QW-IC 3180', source: 'supplier list', confidence: 0.9 },
  // Points at the first part of the supersession chain: a lookup follows it to QW-IC 3140.
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 40-1138', ourPartNumber: 'QW-IC 3138', source: 'supplier list', confidence: 0.85 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 71-0614', ourPartNumber: 'QW-SP 1406', source: 'manual', confidence: 0.8 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 71-1208', ourPartNumber: 'NR/IR 2208', source: 'manual', confidence: 0.8 },
  { foreignBrand: TESSEL_OE, foreignNumber: 'TA 71-1017', ourPartNumber: 'QW-SP 1017', source: 'manual', confidence: 0.8 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7730-160', ourPartNumber: 'QW-IC 3160', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7730-202', ourPartNumber: 'QW-CP 5202', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7730-001', ourPartNumber: 'QW-CN 7001', source: 'manual', confidence: 0.85 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7741-476', ourPartNumber: 'QW-SP 1476T', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7741-455', ourPartNumber: 'QW-SP 1455T', source: 'supplier list', confidence: 0.9 },
  { foreignBrand: ODRIN_OE, foreignNumber: 'OSP-7741-805', ourPartNumber: 'QW-SP 1805', source: 'manual', confidence: 0.85 },
];
