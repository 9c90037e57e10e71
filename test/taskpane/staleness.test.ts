/** When the pane's results stop describing its inputs. Common practice (no source): results must match their inputs. */
import { describe, expect, it } from 'vitest';
import { EMPTY_CHOICES } from '../../src/taskpane/model/choices';
import { changedReadInputs, staleMessage } from '../../src/taskpane/staleness';

const read = { ...EMPTY_CHOICES, response: 'Batches!B1:B61', predictors: 'Batches!C1:G61' };

describe('stale results', () => {
  it('lists the ranges changed since the read, and ignores settings applied to the data already read', () => {
    expect(changedReadInputs(read, { ...read, level: 0.9, intercept: false, knownSigma: '0.5', robust: 'HC3', added: [1] })).toEqual([]);
    expect(changedReadInputs(read, { ...read, weights: 'Batches!J1:J61' })).toEqual(['weights']);
    expect(changedReadInputs(read, { ...read, predictors: 'Batches!C1:F61', newRows: 'Plan!B1:E6' })).toEqual(['predictors', 'newRows']);
  });

  it('says which inputs changed, or that data cells changed, and nothing when the results are current', () => {
    expect(staleMessage([], false)).toBeUndefined();
    expect(staleMessage(['weights'], false)).toMatch(/^Out of date: the weights changed since the data were read\./);
    expect(staleMessage(['response', 'predictors', 'weights'], true)).toMatch(/^Out of date: the response, the predictors and the weights changed/);
    expect(staleMessage([], true)).toMatch(/^These results may be out of date: cells on the data’s sheets changed/);
  });
});
