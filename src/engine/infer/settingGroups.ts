/**
 * Rows grouped by setting: rows whose predictor values are all exactly equal (=== per value, so
 * −0 and 0 are one value) share a group. Groups are numbered in the order of their first row, and
 * each group's rows are chained in row order, so sums taken group by group come out in the same
 * order whatever the grouping's internals.
 *
 * Found by hashing each row's bit patterns into an open-addressed table and comparing the values
 * of rows whose hashes collide: O(n·p), no string or array per row, no copy of the values.
 */
export interface SettingGroups {
  /** Distinct settings. */
  count: number;
  /** First row of each group (count entries). */
  first: Int32Array;
  /** Row after row i in its group, or −1. */
  next: Int32Array;
  /** Rows in each group (count entries). */
  sizes: Int32Array;
}

/** `values` holds `rows` rows of `p` numbers, row-major. */
export function settingGroups(values: Float64Array, rows: number, p: number): SettingGroups {
  let tableSize = 1;
  while (tableSize < 2 * rows) tableSize *= 2;
  const mask = tableSize - 1;
  // Each slot holds a group's number + 1, or 0 (empty), so that the fresh table needs no fill.
  const table = new Int32Array(tableSize);
  const first = new Int32Array(rows);
  const last = new Int32Array(rows);
  const sizes = new Int32Array(rows);
  const next = new Int32Array(rows).fill(-1);
  // The values' bit patterns read in place, two words per value (which half comes first does not matter here).
  const words = new Uint32Array(values.buffer, values.byteOffset, 2 * rows * p);
  let count = 0;
  for (let i = 0; i < rows; i++) {
    const at = i * p;
    let hash = 0x811c9dc5;
    for (let j = 0; j < p; j++) {
      const a = words[2 * (at + j)];
      const b = words[2 * (at + j) + 1];
      // −0 (the sign bit alone, in either half) hashes as 0, which === already counts as equal.
      const negativeZero = (a === 0 && b === 0x80000000) || (a === 0x80000000 && b === 0);
      hash = Math.imul(hash ^ (negativeZero ? 0 : a), 0x01000193);
      hash = Math.imul(hash ^ (negativeZero ? 0 : b), 0x01000193);
    }
    hash ^= hash >>> 16;
    hash = Math.imul(hash, 0x85ebca6b);
    hash ^= hash >>> 13;
    let slot = hash & mask;
    let group = -1;
    for (;;) {
      const candidate = table[slot] - 1;
      if (candidate < 0) break;
      if (sameRow(values, first[candidate] * p, at, p)) {
        group = candidate;
        break;
      }
      slot = (slot + 1) & mask;
    }
    if (group < 0) {
      group = count++;
      table[slot] = group + 1;
      first[group] = i;
    } else {
      next[last[group]] = i;
    }
    last[group] = i;
    sizes[group]++;
  }
  return { count, first: first.subarray(0, count), next, sizes: sizes.subarray(0, count) };
}

function sameRow(values: Float64Array, a: number, b: number, p: number): boolean {
  for (let j = 0; j < p; j++) if (values[a + j] !== values[b + j]) return false;
  return true;
}
