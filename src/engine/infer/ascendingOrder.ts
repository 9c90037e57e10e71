/**
 * The permutation that sorts `values` ascending, equal values (−0 and 0 among them) kept in index
 * order. The numbers' bit patterns are mapped to unsigned keys that order as the numbers do
 * (negative numbers with every bit flipped, others with the sign bit set), common practice (no
 * source), and sorted without a comparison callback per pair: a stable least-significant-digit
 * radix sort by the keys' high 32 bits (sign, exponent and the top of the mantissa), then each run
 * of tied high halves by the low halves. Such ties are values within a relative 2⁻²⁰ of each other,
 * so for most data the runs are short and the sort costs three passes instead of six. Digits of
 * 11 bits keep each pass's 2048 write positions within cache. For finite numbers and ±Infinity;
 * NaN is not ordered.
 */
export function ascendingOrder(values: Float64Array): Int32Array {
  const n = values.length;
  const high = new Uint32Array(n);
  const low = new Uint32Array(n);
  orderedKeys(values, high, low);
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  const scratch = new Int32Array(n);
  const counts = new Int32Array(PASSES * DIGITS);
  sortRun(order, 0, n, high, scratch, counts);
  for (let start = 0; start < n;) {
    const tied = high[order[start]];
    let end = start + 1;
    while (end < n && high[order[end]] === tied) end++;
    if (end - start > SHORT_RUN) sortRun(order, start, end, low, scratch, counts);
    else if (end - start > 1) insertionSort(order, start, end, low);
    start = end;
  }
  return order;
}

/**
 * ascendingOrder, repaired from `guess`, any permutation of the indices 0 … n − 1: an insertion
 * sort by value and then index, which gives the same permutation as ascendingOrder and costs O(n)
 * when the guess is nearly right, as the order before a small edit of the data is. Past
 * MOVES_PER_VALUE·n moves the guess is too far off, and the values are sorted afresh.
 */
export function ascendingOrderFrom(values: Float64Array, guess: Int32Array): Int32Array {
  const n = values.length;
  if (guess.length !== n) return ascendingOrder(values);
  const order = guess.slice();
  let movesLeft = MOVES_PER_VALUE * n;
  for (let k = 1; k < n; k++) {
    const i = order[k];
    const value = values[i];
    let j = k - 1;
    for (; j >= 0; j--) {
      const before = order[j];
      // −0 and 0 compare equal here, as their keys do in ascendingOrder.
      if (values[before] < value || (values[before] === value && before < i)) break;
      order[j + 1] = before;
      if (--movesLeft < 0) return ascendingOrder(values);
    }
    order[j + 1] = i;
  }
  return order;
}

/** Fills high and low with the two 32-bit halves of each value's ordered key; −0 gets the key of 0. */
function orderedKeys(values: Float64Array, high: Uint32Array, low: Uint32Array): void {
  const words = new Uint32Array(values.buffer, values.byteOffset, 2 * values.length);
  for (let i = 0; i < values.length; i++) {
    const h = words[2 * i + HIGH];
    const l = words[2 * i + LOW];
    const negative = h >>> 31 === 1 && !(h === NEGATIVE_ZERO_HIGH && l === 0);
    high[i] = negative ? ~h >>> 0 : (h | 0x80000000) >>> 0;
    low[i] = negative ? ~l >>> 0 : l;
  }
}

/**
 * Stable radix sort of order[from, to) by key[order[k]], a 32-bit key in three digits, least
 * significant first; every digit's counts come from one sweep, pass k's at k·DIGITS.
 */
function sortRun(order: Int32Array, from: number, to: number, key: Uint32Array, scratch: Int32Array, counts: Int32Array): void {
  counts.fill(0);
  for (let k = from; k < to; k++) {
    const keyOf = key[order[k]];
    counts[keyOf & MASK]++;
    counts[DIGITS + ((keyOf >>> DIGIT_BITS) & MASK)]++;
    counts[2 * DIGITS + (keyOf >>> (2 * DIGIT_BITS))]++;
  }
  for (let pass = 0; pass < PASSES; pass++) {
    const base = pass * DIGITS;
    const shift = pass * DIGIT_BITS;
    // Starts of each digit's run; a pass where every key has one digit would leave the order as it is.
    let start = from;
    let trivial = false;
    for (let d = 0; d < DIGITS; d++) {
      const count = counts[base + d];
      if (count === to - from) trivial = true;
      counts[base + d] = start;
      start += count;
    }
    if (trivial) continue;
    for (let k = from; k < to; k++) {
      const i = order[k];
      scratch[counts[base + ((key[i] >>> shift) & MASK)]++] = i;
    }
    order.set(scratch.subarray(from, to), from);
  }
}

/** Stable insertion sort of order[from, to) by key[order[k]]: for the short runs, where it is cheapest. */
function insertionSort(order: Int32Array, from: number, to: number, key: Uint32Array): void {
  for (let k = from + 1; k < to; k++) {
    const i = order[k];
    const keyOf = key[i];
    let j = k - 1;
    for (; j >= from && key[order[j]] > keyOf; j--) order[j + 1] = order[j];
    order[j + 1] = i;
  }
}

const DIGIT_BITS = 11;
const DIGITS = 1 << DIGIT_BITS;
const MASK = DIGITS - 1;
/** Three digits of 11 bits (the last of 10) make one 32-bit half of a key. */
const PASSES = 3;
/** How far, in moves per value, ascendingOrderFrom repairs a guess before it sorts afresh. */
const MOVES_PER_VALUE = 4;
/** Runs of tied high halves up to this length are insertion-sorted, longer ones radix-sorted. */
const SHORT_RUN = 32;

/** Which 32-bit half of a float64 holds its sign and exponent, on this machine's byte order. */
const HIGH = new Uint32Array(Float64Array.of(1).buffer)[1] === 0x3ff00000 ? 1 : 0;
const LOW = 1 - HIGH;
/** The high half of −0 (its low half is 0). */
const NEGATIVE_ZERO_HIGH = 0x80000000;
