import { fisherFUpperTail } from '../distributions/fisherF';
import { predictorValues } from '../cache/packedPredictors';
import type { ModelData } from '../types';
import { settingGroups } from './settingGroups';

/**
 * Lack of fit against pure error (NIST/SEMATECH e-Handbook of Statistical Methods §4.4.4.3;
 * Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, §2.1). Rows that share exactly the same
 * predictor values (a setting) measure the noise without any model: their spread about their own
 * mean is pure error. The residual sum of squares splits as RSS = SS_pure + SS_lack, and
 *   F = (SS_lack/df_lack) / (SS_pure/df_pure),  df_lack = settings − p,  df_pure = n − settings,
 * refers to F(df_lack, df_pure): a small p says the model's shape misses the settings' means by
 * more than the noise explains. It is the F test of the model against one mean per setting, as
 * R's anova(lm(y ~ x), lm(y ~ factor(x))) computes it.
 *
 * Input: the model's data as fitted (`x` the predictor columns; categorical ones already coded, so
 * a setting is a combination of levels and values), its RSS (weighted when weights are given) and
 * its rank p. With weights the pure error is Σwᵢ(yᵢ − ȳ_g)² about each setting's weighted mean.
 */
export interface LackOfFit {
  /** Distinct combinations of predictor values. */
  settings: number;
  lackDf: number;
  pureDf: number;
  lackSs: number;
  pureSs: number;
  f: number;
  pValue: number;
  undefinedBecause: LackOfFitReason | undefined;
}

/**
 * - no-replicates: every row has its own setting, so there is no pure error (df_pure = 0).
 * - no-lack-df: settings ≤ p, the model already fits one mean per setting (df_lack ≤ 0).
 * - replicates-agree: the rows of every setting agree exactly (SS_pure = 0), so F has no scale.
 */
export type LackOfFitReason = 'no-replicates' | 'no-lack-df' | 'replicates-agree';

export function lackOfFit(data: ModelData, rss: number, rank: number): LackOfFit {
  const n = data.y.length;
  const { values, p } = predictorValues(data);
  const groups = settingGroups(values, n, p);
  const settings = groups.count;
  const pureDf = n - settings;
  const lackDf = settings - rank;
  const nan = Number.NaN;
  const result: LackOfFit = { settings, lackDf, pureDf, lackSs: nan, pureSs: nan, f: nan, pValue: nan, undefinedBecause: undefined };
  if (pureDf <= 0) return { ...result, undefinedBecause: 'no-replicates' };
  if (lackDf <= 0) return { ...result, undefinedBecause: 'no-lack-df' };

  const { y, weights } = data;
  const { first, next, sizes } = groups;
  let pureSs = 0;
  for (let g = 0; g < settings; g++) {
    if (sizes[g] < 2) continue;
    // Two passes: the mean first, then squares about it, so a large common level cancels exactly.
    let weightSum = 0;
    let weighted = 0;
    for (let i = first[g]; i >= 0; i = next[i]) {
      const w = weights?.[i] ?? 1;
      weightSum += w;
      weighted += w * y[i];
    }
    const mean = weighted / weightSum;
    for (let i = first[g]; i >= 0; i = next[i]) pureSs += (weights?.[i] ?? 1) * (y[i] - mean) ** 2;
  }
  result.pureSs = pureSs;
  // The difference of two sums of squares can come out a rounding below 0 when the model fits every mean.
  result.lackSs = Math.max(0, rss - pureSs);
  if (!(pureSs > 0)) return { ...result, undefinedBecause: 'replicates-agree' };
  result.f = result.lackSs / lackDf / (pureSs / pureDf);
  result.pValue = fisherFUpperTail(result.f, lackDf, pureDf);
  return result;
}
