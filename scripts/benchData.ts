// Seeded designs for the benchmark, so that every method fits the very same numbers.

function lcg(seed: number): () => number {
  let state = seed;
  return () => {
    state = (Math.imul(state, 1103515245) + 12345) >>> 0;
    return state / 4294967296 - 0.5;
  };
}

/** A well-conditioned design, column-major: y = 1 + Σ xⱼ·(j+1)/p + noise. */
export function generateColumns(n: number, p: number): { x: Float64Array; y: Float64Array } {
  const uniform = lcg(12345);
  const x = new Float64Array(n * p);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let value = 1 + uniform();
    for (let j = 0; j < p; j++) {
      const v = uniform();
      x[j * n + i] = v;
      value += (v * (j + 1)) / p;
    }
    y[i] = value;
  }
  return { x, y };
}

/** An ill-conditioned one, row by row: t, t², …, t^degree with t in [1, 3], and a smooth y with noise. */
export function polynomialRows(n: number, degree: number): { x: number[][]; y: number[] } {
  const uniform = lcg(54321);
  const t = Array.from({ length: n }, () => 2 + 2 * uniform());
  return {
    x: t.map((v) => Array.from({ length: degree }, (_, k) => v ** (k + 1))),
    y: t.map((v) => Math.sin(3 * v) + 0.01 * uniform()),
  };
}
