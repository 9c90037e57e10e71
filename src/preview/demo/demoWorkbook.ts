import type { PreviewWorkbook } from '../workbook/workbook';
import { BATCH_HEADERS, generateBatchLog, PLANNED_BATCHES, PLANNED_HEADERS } from './batchLog';

/** The ranges the demo's formulas read, absolute so they survive being copied. */
export const DEMO_RANGES = {
  y: 'Batches!$B$1:$B$61',
  x: 'Batches!$C$1:$G$61',
  base: 'Batches!$C$1:$F$61',
  added: 'Batches!$G$1:$G$61',
  newX: "'Planned batches'!$B$1:$F$6",
} as const;

/**
 * Fills a workbook with the demo: the batch log, the planned batches, and a "Model" sheet that
 * opens with live PLUMB formulas over them.
 */
export function loadDemo(wb: PreviewWorkbook): void {
  const firstSheet = wb.sheetNames()[0];
  wb.renameSheet(firstSheet, 'Model');
  wb.addSheet('Batches');
  wb.addSheet('Planned batches');
  wb.setInputs('Batches', 0, 0, [BATCH_HEADERS, ...generateBatchLog()]);
  wb.setInputs('Planned batches', 0, 0, [PLANNED_HEADERS, ...PLANNED_BATCHES]);
  const { y, x, base, added, newX } = DEMO_RANGES;
  wb.setInputs('Model', 0, 0, [['Which terms matter?']]);
  wb.setInputs('Model', 1, 0, [[`=PLUMB.TERMS(${y}, ${x})`]]);
  wb.setInputs('Model', 10, 0, [['How well does it fit?']]);
  wb.setInputs('Model', 11, 0, [[`=PLUMB.FITSTATS(${y}, ${x})`]]);
  wb.setInputs('Model', 10, 3, [['Does bean age add anything?']]);
  wb.setInputs('Model', 11, 3, [[`=PLUMB.NESTEDF(${y}, ${base}, ${added})`]]);
  wb.setInputs('Model', 27, 0, [['What to expect for the planned batches']]);
  wb.setInputs('Model', 28, 0, [[`=PLUMB.PREDICT(${y}, ${x}, ${newX})`]]);
  wb.setInputs('Model', 35, 0, [
    [
      'Cautions: these are associations in logged data, not proof of cause; predictions far outside the logged ranges are extrapolations; check the residuals before relying on the intervals.',
    ],
  ]);
  // t to two decimals and CV % to one; estimates and p-values keep their significant digits.
  wb.setNumberFormats(
    'Model',
    2,
    3,
    Array.from({ length: 8 }, () => ['0.00']),
  );
  wb.setNumberFormats(
    'Model',
    2,
    7,
    Array.from({ length: 8 }, () => ['0.0']),
  );
  wb.activateSheet('Model');
}
