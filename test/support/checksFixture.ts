/**
 * The reference values of the assumption checks, computed by R (scripts/reference/checks.R, which
 * records its R, lmtest and car versions in the file) on datasets of R's datasets and carData
 * packages, read once for every test that compares with them.
 */
import { readFileSync } from 'node:fs';

interface DesignCase {
  name: string;
  y: number[];
  /** The model matrix as R builds it, intercept column first when there is one. */
  design: number[][];
}

export interface DurbinWatsonCase extends DesignCase {
  /** Whether the design's first column is the intercept. */
  intercept: boolean;
  statistic: number;
  eigenvalues: number[];
  dwtestGreater: number;
  dwtestTwoSided: number;
  panBelowStatistic: number;
  panAboveStatistic: number;
  grid: number[];
  panBelow: number[];
  panAbove: number[];
  imhofBelow: number[];
  imhofAbove: number[];
}

export interface ShapiroWilkCase {
  name: string;
  x: number[];
  w: number;
  p: number;
}

export interface OutlierCase extends DesignCase {
  studentized: number[];
  /** 1-based, as R numbers rows. */
  row: number;
  largest: number;
  p: number;
  bonferroni: number;
}

export interface LackOfFitCase extends DesignCase {
  settings: number;
  lackDf: number;
  pureDf: number;
  pureSs: number;
  lackSs: number;
  f: number;
  p: number;
}

export interface ChecksFixture {
  computedBy: string;
  durbinWatson: DurbinWatsonCase[];
  shapiroWilk: ShapiroWilkCase[];
  outlierTest: OutlierCase[];
  lackOfFit: LackOfFitCase[];
}

export const checksFixture = JSON.parse(readFileSync(new URL('../engine/infer/fixtures/checks.json', import.meta.url), 'utf8')) as ChecksFixture;

/** A fixture case by its name, failing loudly when the fixture has no such case. */
export function fixtureCase<T extends { name: string }>(cases: readonly T[], name: string): T {
  const found = cases.find((c) => c.name === name);
  if (found === undefined) throw new Error(`no fixture case ${name}`);
  return found;
}

export function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}
