/** Seeded generators so every random test can be replayed exactly. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function gaussian(uniform: () => number): () => number {
  return () => {
    const u = Math.max(uniform(), 1e-300);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
}

export interface RandomProblem {
  y: number[];
  x: number[][];
  beta: number[];
}

/** y = 1 + Σ βⱼxⱼ + noise with independent standard normal predictors: a well-conditioned design. */
export function randomProblem(seed: number, n: number, p: number, noise = 1): RandomProblem {
  const normal = gaussian(mulberry32(seed));
  const beta = Array.from({ length: p }, () => normal());
  const x = Array.from({ length: n }, () => Array.from({ length: p }, () => normal()));
  const y = x.map((row) => 1 + row.reduce((s, v, j) => s + v * beta[j], 0) + noise * normal());
  return { y, x, beta };
}
