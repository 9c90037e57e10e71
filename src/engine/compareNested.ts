import { EngineError } from './errors';
import { solveModel } from './fitModel';
import { fCriticalValue, fUpperTail } from './infer/referenceDistribution';
import { resolveSettings } from './settings';
import type { FitSettings, NestedComparison, NestedData } from './types';

/** Why the nested test is not formed when the added columns add no rank; the pane's streamed test throws it too. */
export const NOTHING_ADDED_MESSAGE = 'The added columns are combinations of the base columns, so they cannot change the fit: there is nothing to test.';

/**
 * The extra-sum-of-squares F test of the full model (base plus added columns) against the base
 * model. Nesting holds by construction, and the denominator is the full model's noise estimate
 * (σ² itself when σ is known, making the reference χ²/df).
 */
export function compareNested(data: NestedData, settings?: FitSettings): NestedComparison {
  const resolved = resolveSettings(settings);
  if (data.base.length !== data.y.length || data.added.length !== data.y.length) {
    throw new EngineError(
      'shape',
      `y has ${data.y.length} rows, the base columns ${data.base.length} and the added columns ${data.added.length}; they must match.`,
    );
  }
  const fullX = data.base.map((row, i) => [...row, ...data.added[i]]);
  const full = solveModel({ y: data.y, x: fullX, weights: data.weights }, resolved);
  const base = solveModel({ y: data.y, x: data.base, weights: data.weights }, resolved);
  const dfNumerator = full.fit.rank - base.fit.rank;
  if (dfNumerator <= 0) {
    throw new EngineError('nothing-added', NOTHING_ADDED_MESSAGE);
  }

  const known = resolved.knownSigma;
  const dfDenominator = known === undefined ? full.fit.residualDf : Number.POSITIVE_INFINITY;
  // Both RSS values are in the same units; taking the difference over one scale avoids overflow.
  const scale = full.solution.yScale;
  const rssFullScaled = full.solution.scaledRss;
  const rssBaseScaled = base.solution.scaledRss * (base.solution.yScale / scale) ** 2;
  const errorScale = known === undefined ? rssFullScaled / dfDenominator : (known / scale) ** 2;
  const f = Math.max(0, rssBaseScaled - rssFullScaled) / dfNumerator / errorScale;
  const fCritical = fCriticalValue(resolved.level, dfNumerator, dfDenominator);

  return {
    f,
    dfNumerator,
    dfDenominator,
    pValue: fUpperTail(f, dfNumerator, dfDenominator),
    fCritical,
    rssBase: base.fit.rss,
    rssFull: full.fit.rss,
    addedHelp: f > fCritical,
  };
}
