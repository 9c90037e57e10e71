/**
 * The preview's demo sheet: every PLUMB formula it writes must spill in full. A block that grows
 * (FITSTATS gained its two F degrees of freedom) must not run into the next one: in Excel a spill
 * onto a non-empty cell shows #SPILL! ("Dynamic arrays and spilled array behavior"), and the
 * preview host blocks it the same way. The demo data are invented and serve only as a layout here.
 */
import { describe, expect, it } from 'vitest';
import { loadDemo } from '../../../src/preview/demo/demoWorkbook';
import { plumbPreview } from '../../support/plumbPreview';

describe('demo workbook', () => {
  it('lays its PLUMB blocks out so that none is blocked from spilling', async () => {
    const model = await plumbPreview('Sheet1');
    loadDemo(model);
    const formulaCells: { row: number; column: number }[] = [];
    for (let row = 0; row < 60; row++) {
      for (let column = 0; column < 12; column++) {
        const input = model.inputAt({ sheet: 'Model', row, column });
        if (typeof input === 'string' && input.startsWith('=PLUMB.')) formulaCells.push({ row, column });
      }
    }
    expect(formulaCells.length).toBe(4);
    for (const at of formulaCells) expect(model.valueAt({ sheet: 'Model', ...at })).not.toHaveProperty('error');
    // FITSTATS ends with BIC, its fifteenth row.
    expect(model.valueAt({ sheet: 'Model', row: 11 + 14, column: 0 })).toBe('BIC');
  });
});
