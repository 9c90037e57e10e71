import { solveModel } from '../fitModel';
import type { FitSettings, ModelData } from '../types';
import { type BreuschPagan, breuschPagan } from './breuschPagan';
import {
  breuschPaganReading,
  COLLINEARITY_REASON_TEXT,
  durbinWatsonReading,
  jarqueBeraReading,
  LARGE_COOKS_DISTANCE,
  LARGE_VIF,
} from './checkReadings';
import { collinearity } from './collinearity';
import { type DurbinWatson, durbinWatson } from './durbinWatson';
import { highLeverageCount, residualDiagnostics } from './influence';
import { type JarqueBera, jarqueBera } from './jarqueBera';

/**
 * The model's assumptions checked in one place: serial independence (Durbin–Watson), constant
 * spread (Breusch–Pagan, Koenker's form), normal residuals (Jarque–Bera), influential and
 * high-leverage rows, and collinearity (largest VIF). Each test is read at α = 1 − level.
 *
 * Weights: the three tests use uᵢ = √wᵢ·eᵢ, the residuals that share one variance under the model
 * (see each test). Known σ: the three tests are free of σ and ignore it; Cook's distance uses it,
 * as in residualDiagnostics.
 */
export interface AssumptionChecks {
  n: number;
  /** Parameters estimated. */
  p: number;
  alpha: number;
  durbinWatson: DurbinWatson & { reading: string };
  breuschPagan: BreuschPagan & { reading: string };
  jarqueBera: JarqueBera & { reading: string };
  /** NaN when no row has one (an exact fit with σ estimated, or every row at leverage 1). */
  largestCooksDistance: number;
  /** Index of that row among the rows of `data`, or −1. */
  largestCooksRow: number;
  /** Rows with leverage above 2p/n. */
  highLeverageRows: number;
  /** Infinity when a term is constant or an exact combination of others; NaN without predictors. */
  largestVif: number;
  largestVifTerm: string | undefined;
  /** Why largestVif is infinite, in words. */
  largestVifReason: string | undefined;
  overall: string;
}

export function assumptionChecks(data: ModelData, settings?: FitSettings): AssumptionChecks {
  const { fit, solution } = solveModel(data, settings);
  const alpha = 1 - fit.settings.level;
  const dw = durbinWatson(solution);
  const bp = breuschPagan(solution, data.x);
  const jb = jarqueBera(solution);

  const diagnostics = residualDiagnostics(data, settings);
  let largestCooksRow = -1;
  diagnostics.rows.forEach((row, i) => {
    if (Number.isFinite(row.cooksDistance) && (largestCooksRow < 0 || row.cooksDistance > diagnostics.rows[largestCooksRow].cooksDistance)) {
      largestCooksRow = i;
    }
  });
  const largestCooksDistance = largestCooksRow < 0 ? Number.NaN : diagnostics.rows[largestCooksRow].cooksDistance;

  const terms = (data.x[0]?.length ?? 0) > 0 ? collinearity(data.x, data.names, data.weights, fit.settings).terms : [];
  const top = terms.reduce<(typeof terms)[number] | undefined>((best, t) => (best === undefined || t.vif > best.vif ? t : best), undefined);

  const checks: AssumptionChecks = {
    n: fit.n,
    p: fit.rank,
    alpha,
    durbinWatson: { ...dw, reading: durbinWatsonReading(dw, alpha) },
    breuschPagan: { ...bp, reading: breuschPaganReading(bp, alpha) },
    jarqueBera: { ...jb, reading: jarqueBeraReading(jb, alpha) },
    largestCooksDistance,
    largestCooksRow,
    highLeverageRows: highLeverageCount(diagnostics),
    largestVif: top?.vif ?? Number.NaN,
    largestVifTerm: top?.name,
    largestVifReason: top?.undefinedBecause === undefined ? undefined : COLLINEARITY_REASON_TEXT[top.undefinedBecause],
    overall: '',
  };
  checks.overall = overallReading(checks, fit.perfectFit);
  return checks;
}

function overallReading(c: AssumptionChecks, perfectFit: boolean): string {
  const concerns: string[] = [];
  if (c.durbinWatson.pTwoSided < c.alpha) concerns.push(c.durbinWatson.statistic < c.durbinWatson.mean ? 'positive autocorrelation' : 'negative autocorrelation');
  if (c.breuschPagan.pValue < c.alpha) concerns.push('uneven residual spread');
  if (c.jarqueBera.pValue < c.alpha) concerns.push('non-normal residuals');
  if (c.largestCooksDistance > LARGE_COOKS_DISTANCE) concerns.push("an influential row (Cook's distance above 1)");
  if (c.largestVif === Number.POSITIVE_INFINITY) concerns.push('terms that are exact combinations of others');
  else if (c.largestVif > LARGE_VIF) concerns.push('strong collinearity (a VIF above 10)');
  if (perfectFit) {
    return ['exact fit: every residual is 0, so the residual checks do not apply', ...concerns].join('; ');
  }
  if (concerns.length === 0) return `nothing stands out at the ${formatLevel(1 - c.alpha)} level`;
  return `worth a look: ${concerns.join(', ')}`;
}

function formatLevel(level: number): string {
  return `${Number((100 * level).toPrecision(6))}%`;
}
