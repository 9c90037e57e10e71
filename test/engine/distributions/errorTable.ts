/**
 * Collects the worst relative error seen per family so each test file can print a short summary;
 * the assertions themselves live in the tests.
 */
export class WorstErrors {
  private readonly worst = new Map<string, { error: number; at: string }>();

  record(family: string, computed: number, expected: number, at: string): number {
    const error = relativeError(computed, expected);
    const current = this.worst.get(family);
    if (current === undefined || error > current.error || Number.isNaN(error)) this.worst.set(family, { error, at });
    return error;
  }

  print(title: string): void {
    const rows = [...this.worst.entries()].map(([family, { error, at }]) => ({
      family,
      worstRelError: error.toExponential(2),
      at,
    }));
    console.log(`\n${title}`);
    console.table(rows);
  }
}

export function relativeError(computed: number, expected: number): number {
  if (computed === expected) return 0;
  return Math.abs(computed - expected) / Math.abs(expected);
}

/** Powers of ten from 10^-from down to 10^-to in steps of `step` decades. */
export function decades(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let k = from; k <= to; k += step) out.push(Number(`1e-${k}`));
  return out;
}
