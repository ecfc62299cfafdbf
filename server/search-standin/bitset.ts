/**
 * Sets of document numbers (`seq`) as plain Uint32Array words: filters are evaluated to these
 * once per distinct expression, combined with word-wide AND/OR, and walked in ascending order.
 */
export type Bitset = Uint32Array;

export function wordsFor(capacity: number): number {
  return (capacity + 31) >>> 5;
}

export function createBitset(capacity: number): Bitset {
  return new Uint32Array(wordsFor(capacity));
}

export function hasBit(bits: Bitset, index: number): boolean {
  return ((bits[index >>> 5] as number) & (1 << (index & 31))) !== 0;
}

export function setBit(bits: Bitset, index: number): void {
  bits[index >>> 5] = (bits[index >>> 5] as number) | (1 << (index & 31));
}

export function clearBit(bits: Bitset, index: number): void {
  bits[index >>> 5] = (bits[index >>> 5] as number) & ~(1 << (index & 31));
}

/** A copy of `bits` sized for `capacity`, zero-extended or cut. */
export function resized(bits: Bitset, capacity: number): Bitset {
  const out = createBitset(capacity);
  out.set(bits.length <= out.length ? bits : bits.subarray(0, out.length));
  return out;
}

export function andInto(target: Bitset, other: Bitset): void {
  for (let i = 0; i < target.length; i++) target[i] = (target[i] as number) & (other[i] ?? 0);
}

export function orInto(target: Bitset, other: Bitset): void {
  const n = Math.min(target.length, other.length);
  for (let i = 0; i < n; i++) target[i] = (target[i] as number) | (other[i] as number);
}

/** target = universe AND NOT target. */
export function complementWithin(target: Bitset, universe: Bitset): void {
  for (let i = 0; i < target.length; i++) target[i] = (universe[i] ?? 0) & ~(target[i] as number);
}

function popcount32(value: number): number {
  let v = value - ((value >>> 1) & 0x55555555);
  v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
  return (Math.imul((v + (v >>> 4)) & 0x0f0f0f0f, 0x01010101) >>> 24) as number;
}

export function countBits(bits: Bitset): number {
  let count = 0;
  for (let i = 0; i < bits.length; i++) {
    const word = bits[i] as number;
    if (word !== 0) count += popcount32(word);
  }
  return count;
}

/** The set members in ascending order, written to `out` (which must be large enough); returns how many. */
export function listBits(bits: Bitset, out: Int32Array, limit = out.length): number {
  let n = 0;
  for (let i = 0; i < bits.length && n < limit; i++) {
    let word = bits[i] as number;
    while (word !== 0 && n < limit) {
      const low = word & -word;
      out[n++] = (i << 5) | (31 - Math.clz32(low));
      word ^= low;
    }
  }
  return n;
}

/** How many members `a` and `b` share. */
export function countAnd(a: Bitset, b: Bitset): number {
  const n = Math.min(a.length, b.length);
  let count = 0;
  for (let i = 0; i < n; i++) {
    const word = (a[i] as number) & (b[i] as number);
    if (word !== 0) count += popcount32(word);
  }
  return count;
}

/** The smallest member of both `a` and `b`, or -1. */
export function firstOfAnd(a: Bitset, b: Bitset): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    const word = (a[i] as number) & (b[i] as number);
    if (word !== 0) return (i << 5) | (31 - Math.clz32(word & -word));
  }
  return -1;
}
