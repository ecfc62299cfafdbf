import type { LocationSeed } from './types';

/** The invented chain: three stores of Harbor Lane Auto Parts in an invented town. The first opened first. */
export const locations: LocationSeed[] = [
  {
    name: 'Harbor Lane Quayside',
    address: '14 Wharf Row, Port Ellery',
    phone: '555-0140',
    openingHours: 'Mon–Fri 7:30–18:00, Sat 8:00–14:00',
  },
  {
    name: 'Harbor Lane Eastgate',
    address: '202 Tannery Road, Port Ellery',
    phone: '555-0162',
    openingHours: 'Mon–Fri 8:00–18:00, Sat 8:00–13:00',
  },
  {
    name: 'Harbor Lane Millbrook',
    address: '7 Mill Green, Millbrook-on-Ellery',
    phone: '555-0187',
    openingHours: 'Mon–Sat 8:00–17:00',
  },
];

export const [QUAYSIDE, EASTGATE, MILLBROOK] = locations.map((l) => l.name) as [string, string, string];
