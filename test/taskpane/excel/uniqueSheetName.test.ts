/** A new report never takes an existing sheet's name (Excel compares names without case). */
import { describe, expect, it } from 'vitest';
import { uniqueSheetName } from '../../../src/taskpane/excel/uniqueSheetName';

describe('uniqueSheetName', () => {
  it('numbers the name until it is free', () => {
    expect(uniqueSheetName('Plumbline report', ['Batches'])).toBe('Plumbline report');
    expect(uniqueSheetName('Plumbline report', ['plumbline REPORT', 'Plumbline report 2'])).toBe('Plumbline report 3');
  });
});
