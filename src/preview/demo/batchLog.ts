/**
 * The demo's invented scenario: a small cold-brew coffee producer logs each batch. The data are
 * generated, not measured, from this formula with seeded Gaussian noise (σ = 0.35 points):
 *
 *   yield (%) = 19.0 + 0.42·(steep − 18) − 0.004·(grind − 900) + 0.08·(temp − 12)
 *               + 0.003·(bean age − 20) + origin effect + noise
 *
 * with origin effects Alta Verde 0, Kumari Hills +0.6, Sierra Lumo −0.4. Bean age's true effect is
 * near zero on purpose, so the nested F test has something to decide. These numbers serve the
 * demo only; no test uses them as a check of the engine.
 */

export const ORIGINS = ['Alta Verde', 'Kumari Hills', 'Sierra Lumo'] as const;
const ORIGIN_EFFECT: Record<(typeof ORIGINS)[number], number> = { 'Alta Verde': 0, 'Kumari Hills': 0.6, 'Sierra Lumo': -0.4 };

export const BATCH_HEADERS = ['Batch', 'Extraction yield (%)', 'Steep time (h)', 'Grind size (µm)', 'Water temp (°C)', 'Origin', 'Bean age (days)'];
export const PLANNED_HEADERS = ['Batch', 'Steep time (h)', 'Grind size (µm)', 'Water temp (°C)', 'Origin', 'Bean age (days)'];

export type BatchRow = [string, number, number, number, number, string, number];
export type PlannedRow = [string, number, number, number, string, number];

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const round = (v: number, step: number): number => Math.round(v / step) * step;
const fixed = (v: number, digits: number): number => Number(v.toFixed(digits));

export function trueYield(steep: number, grind: number, temp: number, origin: (typeof ORIGINS)[number], age: number): number {
  return 19 + 0.42 * (steep - 18) - 0.004 * (grind - 900) + 0.08 * (temp - 12) + 0.003 * (age - 20) + ORIGIN_EFFECT[origin];
}

export function generateBatchLog(seed = 20261204, rows = 60): BatchRow[] {
  const uniform = mulberry32(seed);
  const normal = (): number => Math.sqrt(-2 * Math.log(Math.max(uniform(), 1e-12))) * Math.cos(2 * Math.PI * uniform());
  return Array.from({ length: rows }, (_, i): BatchRow => {
    const steep = fixed(round(12 + 12 * uniform(), 0.5), 1);
    const grind = round(700 + 500 * uniform(), 10);
    const temp = fixed(round(4 + 18 * uniform(), 0.5), 1);
    const origin = ORIGINS[Math.floor(uniform() * ORIGINS.length)];
    const age = Math.round(5 + 40 * uniform());
    const yieldPct = fixed(trueYield(steep, grind, temp, origin, age) + 0.35 * normal(), 2);
    return [`CB-${String(i + 1).padStart(3, '0')}`, yieldPct, steep, grind, temp, origin, age];
  });
}

export const PLANNED_BATCHES: PlannedRow[] = [
  ['P-01', 16, 850, 10, 'Alta Verde', 12],
  ['P-02', 20, 900, 14, 'Kumari Hills', 25],
  ['P-03', 22, 1000, 8, 'Sierra Lumo', 30],
  ['P-04', 18, 760, 18, 'Kumari Hills', 8],
  ['P-05', 14, 1150, 20, 'Alta Verde', 40],
];
