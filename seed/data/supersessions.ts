import type { SupersessionSeed } from './types';

/** A three-part chain: QW-IC 3138 → QW-IC 3139 → QW-IC 3140 (current). */
export const supersessions: SupersessionSeed[] = [
  {
    partNumber: 'QW-IC 3138',
    supersededBy: 'QW-IC 3139',
    effectiveDate: '2019-03-01',
    reason: 'Boot material changed after tower cracking reports.',
  },
  {
    partNumber: 'QW-IC 3139',
    supersededBy: 'QW-IC 3140',
    effectiveDate: '2022-06-01',
    reason: 'Winding revised for more available voltage.',
  },
];
