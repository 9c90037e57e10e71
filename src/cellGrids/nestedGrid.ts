import type { NestedComparison } from '../engine';
import { nestedReading } from '../presentation';
import { finiteOrBlank, type Grid } from './gridCell';

export function nestedGrid(result: NestedComparison): Grid {
  return [
    ['F', finiteOrBlank(result.f)],
    ['df added', result.dfNumerator],
    ['df residual', Number.isFinite(result.dfDenominator) ? result.dfDenominator : 'infinite (σ known)'],
    ['p-value', finiteOrBlank(result.pValue)],
    ['Critical F', finiteOrBlank(result.fCritical)],
    ['RSS base', finiteOrBlank(result.rssBase)],
    ['RSS full', finiteOrBlank(result.rssFull)],
    ['Reading', nestedReading(result)],
  ];
}
