import type { BrandSeed, HeatCodeStep, OeBrandSeed } from './types';

/** Numbered codes that run the same way as the heat step, shifted: code 5 is step 4. */
const quaywellHeatCodes: HeatCodeStep[] = Array.from({ length: 9 }, (_, i) => ({
  code: String(i + 4),
  heatStep: i + 3,
}));

/** Numbered codes that run the other way: a higher number is a hotter plug (code 12 is step 2). */
const sparrowfieldHeatCodes: HeatCodeStep[] = Array.from({ length: 11 }, (_, i) => ({
  code: String(i + 2),
  heatStep: 12 - i,
}));

/** Letter codes, later in the alphabet is colder: R is step 4 … X is step 10. */
const norrowHeatCodes: HeatCodeStep[] = ['R', 'S', 'T', 'U', 'V', 'W', 'X'].map((code, i) => ({
  code,
  heatStep: i + 4,
}));

export const QUAYWELL = 'Quaywell';
export const NORROW = 'Norrow';
export const SPARROWFIELD = 'Sparrowfield';
export const CALDER = 'Calder Ignition';

export const brands: BrandSeed[] = [
  {
    name: QUAYWELL,
    ours: true,
    kinds: ['coil', 'plug'],
    heatCodes: quaywellHeatCodes,
    heatCodeNote: 'Numbered 4–12; a higher number is a colder plug.',
  },
  {
    name: NORROW,
    ours: true,
    kinds: ['plug'],
    heatCodes: norrowHeatCodes,
    heatCodeNote: 'Lettered R–X; a later letter is a colder plug.',
  },
  {
    name: SPARROWFIELD,
    ours: false,
    kinds: ['coil', 'plug'],
    heatCodes: sparrowfieldHeatCodes,
    heatCodeNote: 'Numbered 2–12; a higher number is a hotter plug.',
  },
  {
    name: CALDER,
    ours: false,
    kinds: ['coil'],
    heatCodes: [],
    heatCodeNote: null,
  },
];

export const TESSEL_OE = 'Tessel Automotive';
export const ODRIN_OE = 'Odrin Service Parts';

export const oeBrands: OeBrandSeed[] = [
  { name: TESSEL_OE, suppliesMakes: ['Varrick', 'Kaymor', 'Talvena'] },
  { name: ODRIN_OE, suppliesMakes: ['Odrin'] },
];
