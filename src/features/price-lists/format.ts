/** Price-list figures that are not plain formatting (that is shared/format.ts). */

/** The move from one price to another in percent of the old one, or null when there is no old one. */
export function percentChange(oldCents: number | null, newCents: number): number | null {
  if (oldCents === null || oldCents === 0) return null;
  return ((newCents - oldCents) / oldCents) * 100;
}
