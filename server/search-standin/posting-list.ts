/**
 * The documents one word occurs in. Entries are appended; a document that is deleted or
 * rewritten leaves stale entries behind, recognised by their slot no longer being live and
 * dropped when a read finds too many of them — cheaper than removing a document from every
 * list it is in (a common word is in tens of thousands).
 */

/** Field ranks are kept as a bitmask; ranks past this one share its bit. */
export const MAX_FIELD_BIT = 23;
const FREQUENCY_SHIFT = MAX_FIELD_BIT + 1;
const MAX_FREQUENCY = 127;

export interface PostingList {
  slots: number[];
  /** Per entry: bitmask of the fields holding the word, and its frequency in the high bits. */
  infos: number[];
}

export function createPostingList(): PostingList {
  return { slots: [], infos: [] };
}

export function packInfo(fieldMask: number, frequency: number): number {
  return fieldMask | (Math.min(frequency, MAX_FREQUENCY) << FREQUENCY_SHIFT);
}

export function fieldMaskOf(info: number): number {
  return info & ((1 << FREQUENCY_SHIFT) - 1);
}

export function frequencyOf(info: number): number {
  return info >>> FREQUENCY_SHIFT;
}

export function fieldBit(rank: number): number {
  return 1 << Math.min(rank, MAX_FIELD_BIT);
}

/** Rank of the best (lowest) field in a mask. */
export function bestFieldRank(mask: number): number {
  return 31 - Math.clz32(mask & -mask);
}

/** Drops stale entries in place once they are at least half the list; returns the live count. */
export function compactIfStale(list: PostingList, isLive: (slot: number) => boolean, staleSeen: number): number {
  const total = list.slots.length;
  if (staleSeen * 2 < total) return total - staleSeen;
  let kept = 0;
  for (let i = 0; i < total; i++) {
    const slot = list.slots[i] as number;
    if (!isLive(slot)) continue;
    list.slots[kept] = slot;
    list.infos[kept] = list.infos[i] as number;
    kept++;
  }
  list.slots.length = kept;
  list.infos.length = kept;
  return kept;
}
