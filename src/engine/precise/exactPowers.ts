import { ddMul, pair } from './doubleDouble';

/** A design column in double-double: the value of row i is hi[i] + lo[i]. */
export interface ExtendedColumn {
  hi: Float64Array;
  lo: Float64Array;
}

/** Powers above this are not looked for: no polynomial design of use goes that high. */
const MAX_EXPONENT = 30;

/** One unit in the last place, relative: a computed power may be off by that much (pow is not always correctly rounded). */
const POWER_ROUNDING = 2 ** -52;

/**
 * Finds the columns that are powers of another column, x^k rounded to double (as a sheet's
 * `=x^k` leaves them), and returns them as x^k in double-double. A polynomial model's
 * certified solution is that of the exact powers: rounding x¹⁰ to double perturbs the design by
 * one part in 10¹⁶, and Filip's κ turns that into the loss of eight digits. Entries that match
 * to within a rounding of the exact power are the rounding of it, so taking the exact value
 * changes the data by less than their own last digit.
 *
 * `columns[j]` is column j of the unweighted design; the result holds an ExtendedColumn where the
 * column was recognised and undefined elsewhere.
 */
export function recognisePowers(columns: readonly Float64Array[]): (ExtendedColumn | undefined)[] {
  const probes = columns.map(probeRow);
  return columns.map((column, j) => {
    for (let b = 0; b < columns.length; b++) {
      const row = probes[b];
      if (b === j || row === undefined) continue;
      const exponent = Math.round(Math.log(Math.abs(column[row])) / Math.log(Math.abs(columns[b][row])));
      if (!(exponent >= 2 && exponent <= MAX_EXPONENT)) continue;
      // A cheap look at the probe row first: most unrelated columns fail there.
      const probe = columns[b][row] ** exponent;
      if (!(Math.abs(column[row] - probe) <= 4 * POWER_ROUNDING * Math.abs(probe))) continue;
      const power = exactPower(columns[b], exponent);
      if (matchesRounded(column, power)) return power;
    }
    return undefined;
  });
}

/**
 * The row where a base column is farthest from 1 in log terms, where a power's exponent reads
 * most clearly; undefined for a base of only 0s and ±1s, which has no unique exponent.
 */
function probeRow(base: Float64Array): number | undefined {
  let row: number | undefined;
  let spread = 1e-3;
  for (let i = 0; i < base.length; i++) {
    const logBase = Math.abs(Math.log(Math.abs(base[i])));
    if (Number.isFinite(logBase) && logBase > spread) {
      spread = logBase;
      row = i;
    }
  }
  return row;
}

function exactPower(base: Float64Array, exponent: number): ExtendedColumn {
  const hi = new Float64Array(base.length);
  const lo = new Float64Array(base.length);
  const t = pair();
  for (let i = 0; i < base.length; i++) {
    t[0] = base[i];
    t[1] = 0;
    for (let k = 1; k < exponent; k++) ddMul(t[0], t[1], base[i], 0, t);
    hi[i] = t[0];
    lo[i] = t[1];
  }
  return { hi, lo };
}

function matchesRounded(column: Float64Array, power: ExtendedColumn): boolean {
  for (let i = 0; i < column.length; i++) {
    const exact = power.hi[i];
    if (!(Math.abs(column[i] - exact - power.lo[i]) <= POWER_ROUNDING * Math.abs(exact))) return false;
  }
  return true;
}
