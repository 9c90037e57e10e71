/**
 * The prediction cards' text. The wording is the pane's own (issue #14); each range and interval
 * below is read off the invented rows by hand (common practice (no source)). The numbers of the
 * intervals themselves are the engine's, checked in test/engine.
 */
import { describe, expect, it } from 'vitest';
import { buildModelFrame, fitModel } from '../../../src/engine';
import type { LabelledPrediction } from '../../../src/taskpane/model/paneAnalysis';
import { observedRanges, predictionCard, predictionIntervalsNote, rangesByName } from '../../../src/taskpane/model/predictionCards';

const grid = [
  ['Yield (%)', 'Grind size', 'Steep time (h)', 'Origin'],
  [20.1, 18, 12, 'Alta'],
  [21.4, 22, 14, 'Baja'],
  [19.8, 27, 16, 'Alta'],
  [22.0, 20, 18, 'Baja'],
  [20.7, 25, 20, 'Alta'],
  [21.1, 24, 13, 'Baja'],
];
const frame = buildModelFrame({ y: grid.map((r) => [r[0]]), x: [grid.map((r) => r.slice(1))], intercept: true });
const classical = fitModel(frame.data);
const robust = fitModel(frame.data, { covariance: 'HC3' });
const observed = observedRanges(frame);

const prediction = (overrides: Partial<LabelledPrediction>): LabelledPrediction => ({
  label: 'P-01',
  labelFromCell: true,
  sheetRow: 2,
  inputs: [
    { name: 'Grind size', value: 22 },
    { name: 'Steep time (h)', value: 15 },
    { name: 'Origin', value: 'Baja' },
  ],
  estimate: 21.04,
  meanLow: 20.61,
  meanHigh: 21.47,
  newLow: 19.9,
  newHigh: 22.18,
  outsideRange: [],
  hiddenExtrapolation: false,
  notPredicted: undefined,
  ...overrides,
});

describe('observedRanges', () => {
  it('gives each numeric predictor its smallest and largest value over the rows used, and categories none', () => {
    expect(observed.get('Grind size')).toEqual({ min: 18, max: 27 });
    expect(observed.get('Steep time (h)')).toEqual({ min: 12, max: 20 });
    expect(observed.has('Origin')).toBe(false);
  });

  it('leaves out rows the fit skipped', () => {
    const withBlank = buildModelFrame({ y: [['y'], [1], [null], [3], [2]], x: [[['x'], [5], [99], [7], [6]]], intercept: true });
    expect(observedRanges(withBlank).get('x')).toEqual({ min: 5, max: 7 });
  });
});

describe('predictionCard', () => {
  it('labels the row, lists its inputs with their units, and gives the estimate and both intervals at the level', () => {
    const card = predictionCard(prediction({}), { responseName: 'Yield (%)', level: 0.9, observed });
    expect(card.label).toBe('P-01');
    expect(card.inputs).toBe('Inputs: Grind size 22, Steep time 15 h, Origin Baja.');
    expect(card.estimate).toBe('Predicted yield: 21.0%.');
    expect(card.meanInterval).toBe('90% interval for the average at these inputs: 20.6% to 21.5%.');
    expect(card.newInterval).toBe('90% interval for one new measurement: 19.9% to 22.2%.');
    expect(card.flags).toEqual([]);
  });

  it('names each predictor outside its observed range, with the range', () => {
    const card = predictionCard(
      prediction({
        inputs: [
          { name: 'Grind size', value: 31 },
          { name: 'Steep time (h)', value: 11 },
          { name: 'Origin', value: 'Alta' },
        ],
        outsideRange: ['Grind size', 'Steep time (h)'],
      }),
      { responseName: 'Yield (%)', level: 0.95, observed },
    );
    expect(card.flags).toEqual([
      'Grind size 31 lies outside the observed 18–27: the prediction extrapolates.',
      'Steep time 11 h lies outside the observed 12–20 h: the prediction extrapolates.',
    ]);
  });

  it('takes a streamed read’s ranges by predictor name', () => {
    const streamed = rangesByName(['Grind size', 'Steep time (h)'], [18, 12], [27, 20]);
    const card = predictionCard(prediction({ outsideRange: ['Grind size'] }), { responseName: 'Yield (%)', level: 0.95, observed: streamed });
    expect(card.flags).toEqual(['Grind size 22 lies outside the observed 18–27: the prediction extrapolates.']);
  });

  it('says so without a range when the analysis kept none', () => {
    const card = predictionCard(prediction({ outsideRange: ['Grind size'] }), { responseName: 'Yield (%)', level: 0.95, observed: new Map() });
    expect(card.flags).toEqual(['Grind size 22 lies outside the range of the data used: the prediction extrapolates.']);
  });

  it('flags hidden extrapolation: every value inside its range, the combination outside the data', () => {
    const card = predictionCard(prediction({ hiddenExtrapolation: true }), { responseName: 'Yield (%)', level: 0.95, observed });
    expect(card.flags).toHaveLength(1);
    expect(card.flags[0]).toContain('this combination lies outside the data’s pattern (hidden extrapolation)');
  });

  it('notes under robust standard errors that the prediction intervals stay classical', () => {
    expect(predictionIntervalsNote(robust)).toBe('Prediction intervals (classical standard errors, not HC3).');
    expect(predictionIntervalsNote(classical)).toBeUndefined();
  });

  it('gives no numbers for a row that is not predicted, and says why', () => {
    const unpredicted = { estimate: Number.NaN, meanLow: Number.NaN, meanHigh: Number.NaN, newLow: Number.NaN, newHigh: Number.NaN };
    const card = predictionCard(prediction({ ...unpredicted, notPredicted: 'Not predicted: a blank in Grind size.' }), {
      responseName: 'Yield (%)',
      level: 0.95,
      observed,
    });
    expect(card.estimate).toBe('Not predicted: a blank in Grind size.');
    expect(card.meanInterval).toBe('');
    expect(card.newInterval).toBe('');
  });
});
