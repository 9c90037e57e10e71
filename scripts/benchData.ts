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

/**
 * generateColumns' design with y's noise sized for a chosen R²: y = 1 + Σ xⱼ·(j+1)/p + noise, the
 * noise uniform with variance (1 − R²)/R² times the signal's. The same shape at R² = 0.5 and
 * 0.9999 costs double precision alike; only the precision checks can tell them apart.
 */
export function generateWithRSquared(n: number, p: number, rSquared: number): { x: Float64Array; y: Float64Array } {
  const uniform = lcg(24680);
  const x = new Float64Array(n * p);
  const y = new Float64Array(n);
  // Each xⱼ is uniform on (−½, ½), variance 1/12, so the signal's variance is Σ((j+1)/p)²/12.
  let signalVariance = 0;
  for (let j = 0; j < p; j++) signalVariance += ((j + 1) / p) ** 2 / 12;
  const noiseWidth = Math.sqrt((12 * signalVariance * (1 - rSquared)) / rSquared);
  for (let i = 0; i < n; i++) {
    let value = 1;
    for (let j = 0; j < p; j++) {
      const v = uniform();
      x[j * n + i] = v;
      value += (v * (j + 1)) / p;
    }
    y[i] = value + noiseWidth * uniform();
  }
  return { x, y };
}
