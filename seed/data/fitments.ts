import { engines } from './engines';
import type { EngineSeed, FitmentSeed } from './types';

/** The fitted coil and plug of every engine, by engine code. */
const fitted: Record<string, { coil: string; plug: string }> = {
  VK16: { coil: 'QW-IC 3101', plug: 'QW-SP 1406' },
  VK18: { coil: 'QW-IC 3101', plug: 'QW-SP 1406' },
  VK25: { coil: 'QW-IC 3101', plug: 'QW-SP 1406' },
  VK14T: { coil: 'QW-IC 3120', plug: 'NR/IR 2208' },
  VK20T: { coil: 'QW-IC 3120', plug: 'NR/IR 2208' },
  VK35T: { coil: 'QW-IC 3120', plug: 'NR/IR 2209' },
  VK30: { coil: 'QW-CP 5201', plug: 'QW-SP 1411' },
  SN12: { coil: 'QW-IC 3140', plug: 'QW-SP 1217' },
  SN15: { coil: 'QW-IC 3140', plug: 'NR/FW 2217' },
  SN18: { coil: 'QW-IC 3140', plug: 'QW-SP 1406' },
  SN20: { coil: 'QW-IC 3140', plug: 'QW-SP 1406' },
  SN20T: { coil: 'QW-IC 3150', plug: 'NR/IR 2208' },
  SN30T: { coil: 'QW-IC 3150', plug: 'NR/IR 2208' },
  SN25: { coil: 'QW-CP 5201', plug: 'QW-SP 1411' },
  OD20: { coil: 'QW-IC 3160', plug: 'QW-SP 1406' },
  OD24: { coil: 'QW-CP 5202', plug: 'QW-SP 1411' },
  OD27T: { coil: 'QW-IC 3160', plug: 'NR/IR 2208' },
  OD33: { coil: 'QW-IC 3160', plug: 'QW-SP 1406' },
  OD40: { coil: 'QW-CN 7001', plug: 'QW-SP 1805' },
  OD50: { coil: 'QW-IC 3160', plug: 'QW-SP 1476T' },
  OD57: { coil: 'QW-CP 5202', plug: 'QW-SP 1455T' },
  KM10: { coil: 'QW-IC 3170', plug: 'QW-SP 1217' },
  KM10T: { coil: 'QW-IC 3170', plug: 'NR/IR 2208' },
  KM13: { coil: 'QW-CP 5202', plug: 'QW-SP 1435' },
  KM16: { coil: 'QW-IC 3170', plug: 'QW-SP 1017' },
  KM16T: { coil: 'QW-IC 3170', plug: 'NR/IR 2208' },
  TV16: { coil: 'QW-IC 3180', plug: 'QW-SP 1017' },
  TV18S: { coil: 'QW-IC 3180', plug: 'NR/IR 2208' },
  TV20: { coil: 'QW-IC 3180', plug: 'QW-SP 1406' },
  TV22: { coil: 'QW-CP 5202', plug: 'QW-SP 1411' },
  TV23T: { coil: 'QW-IC 3180', plug: 'NR/IR 2209' },
  TV36: { coil: 'QW-IC 3180', plug: 'QW-SP 1217' },
};

/** One coil per cylinder, one canister per distributor, one two-tower pack per cylinder pair. */
function coilQuantity(engine: EngineSeed): number {
  switch (engine.ignition) {
    case 'distributor-canister':
      return 1;
    case 'waste-spark-pack':
      return engine.cylinders / 2;
    default:
      return engine.cylinders;
  }
}

export const fitments: FitmentSeed[] = engines.flatMap((engine) => {
  const parts = fitted[engine.code];
  if (!parts) throw new Error(`No fitted parts for engine ${engine.code}`);
  return [
    {
      engineCode: engine.code,
      partNumber: parts.coil,
      position: 'ignition coil',
      quantity: coilQuantity(engine),
    },
    {
      engineCode: engine.code,
      partNumber: parts.plug,
      position: 'spark plug',
      quantity: engine.cylinders,
    },
  ];
});
