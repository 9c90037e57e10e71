import type { AssumptionChecks } from '../engine';
import { breuschPaganReading, durbinWatsonReading } from './checkReadings';
import { lackOfFitReading } from './lackOfFitReadings';
import { jarqueBeraReading, shapiroWilkReading } from './normalityReadings';
import { outlierReading } from './outlierReadings';

export interface CheckLine {
  /** The question the check answers, in the user's words. */
  question: string;
  /** The same reading PLUMB.CHECKS shows for it. */
  reading: string;
}

/**
 * Every assumption check as one line, in the order the overall reading weighs them (an outlier
 * first, since it can cause the other signals), each with the reading CHECKS gives it, so the pane
 * and the cells say the same thing. Normality is read on Shapiro–Wilk, or on Jarque–Bera above
 * Shapiro–Wilk's range.
 */
export function checkList(checks: AssumptionChecks): CheckLine[] {
  return [
    { question: 'A row far off the others?', reading: outlierReading(checks.outlierTest) },
    { question: 'Neighbouring rows related?', reading: durbinWatsonReading(checks.durbinWatson) },
    { question: 'Spread changing?', reading: breuschPaganReading(checks.breuschPagan) },
    {
      question: 'Roughly normal?',
      reading: checks.shapiroWilk.verdict === 'too-many' ? jarqueBeraReading(checks.jarqueBera) : shapiroWilkReading(checks),
    },
    { question: 'Straight enough where settings repeat?', reading: lackOfFitReading(checks.lackOfFit) },
  ];
}
