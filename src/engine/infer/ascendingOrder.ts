/**
 * The permutation that sorts `values` ascending, equal values (−0 and 0 among them) kept in index
 * order: a stable least-significant-digit radix sort of the numbers' bit patterns, O(n) and without
 * a comparison callback per pair. The patterns are mapped to unsigned keys that order as the numbers
 * do (negative numbers with every bit flipped, others with the sign bit set), common practice (no
 * source). Digits of 11 bits (six passes) keep each pass's 2048 write positions within cache. For
 * finite numbers and ±Infinity; NaN is not ordered.
 */
export function ascendingOrder(values: Float64Array): Int32Array {
  const n = values.length;
  const bits = new Float64Array(n);
  // + 0 makes −0 the same key as 0.
  for (let i = 0; i < n; i++) bits[i] = values[i] + 0;
  const words = new Uint32Array(bits.buffer);
  const high = new Uint32Array(n);
  const low = new Uint32Array(n);
  // Every pass's digit counts in one sweep, pass k's at k·DIGITS.
  const counts = new Int32Array(PASSES.length * DIGITS);
  for (let i = 0; i < n; i++) {
    const h = words[2 * i + HIGH];
    const l = words[2 * i + LOW];
    const negative = h >>> 31 === 1;
    const kh = negative ? ~h >>> 0 : (h | 0x80000000) >>> 0;
    const kl = negative ? ~l >>> 0 : l;
    high[i] = kh;
    low[i] = kl;
    counts[kl & MASK]++;
    counts[DIGITS + ((kl >>> 11) & MASK)]++;
    counts[2 * DIGITS + (kl >>> 22)]++;
    counts[3 * DIGITS + (kh & MASK)]++;
    counts[4 * DIGITS + ((kh >>> 11) & MASK)]++;
    counts[5 * DIGITS + (kh >>> 22)]++;
  }
  let order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  let next = new Int32Array(n);
  for (let pass = 0; pass < PASSES.length; pass++) {
    const [half, shift] = PASSES[pass];
    const key = half === 'low' ? low : high;
    const base = pass * DIGITS;
    // Starts of each digit's run; a pass where every key has one digit would leave the order as it is.
    let start = 0;
    let trivial = false;
    for (let d = 0; d < DIGITS; d++) {
      const count = counts[base + d];
      if (count === n) trivial = true;
      counts[base + d] = start;
      start += count;
    }
    if (trivial) continue;
    for (let k = 0; k < n; k++) {
      const i = order[k];
      next[counts[base + ((key[i] >>> shift) & MASK)]++] = i;
    }
    const sorted = next;
    next = order;
    order = sorted;
  }
  return order;
}

const DIGIT_BITS = 11;
const DIGITS = 1 << DIGIT_BITS;
const MASK = DIGITS - 1;
/** The six digits, least significant first: bits 0, 11 and 22 of the low half, then of the high half. */
const PASSES: readonly (readonly ['low' | 'high', number])[] = [
  ['low', 0],
  ['low', 11],
  ['low', 22],
  ['high', 0],
  ['high', 11],
  ['high', 22],
];

/** Which 32-bit half of a float64 holds its sign and exponent, on this machine's byte order. */
const HIGH = new Uint32Array(Float64Array.of(1).buffer)[1] === 0x3ff00000 ? 1 : 0;
const LOW = 1 - HIGH;
