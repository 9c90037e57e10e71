/**
 * The whole self-check workbook as a plan: the Summary first, then one sheet per dataset. The
 * NIST files are read in place from the folder beside the repository; the ToothGrowth data and
 * reference values from the committed toothGrowth.json.
 */
import { resolve } from 'node:path';
import { buildDatasetSheet } from './datasetSheet';
import type { SelfCheckPlan } from './plan';
import { STRD_SHEETS, strdSheetSpec } from './strdSheets';
import { readStrdFile } from './strdFile';
import { buildSummarySheet } from './summarySheet';
import { readToothGrowthReference, toothGrowthSheetSpec } from './toothGrowthSheet';

export const REPOSITORY_ROOT = resolve(__dirname, '..', '..');
export const STRD_FOLDER = resolve(REPOSITORY_ROOT, '..', 'shared', 'reference', 'strd');
export const TOOTH_GROWTH_REFERENCE = resolve(__dirname, 'toothGrowth.json');
export const SELF_CHECK_WORKBOOK = resolve(REPOSITORY_ROOT, 'assets', 'plumbline-self-check.xlsx');

export function buildSelfCheckPlan(strdFolder = STRD_FOLDER, toothGrowthReference = TOOTH_GROWTH_REFERENCE): SelfCheckPlan {
  const datasets = [
    ...STRD_SHEETS.map((name) => buildDatasetSheet(strdSheetSpec(name, readStrdFile(resolve(strdFolder, `${name}.dat`))))),
    buildDatasetSheet(toothGrowthSheetSpec(readToothGrowthReference(toothGrowthReference))),
  ];
  const summary = buildSummarySheet(
    datasets.map((d) => ({ name: d.sheet.name, checkCount: d.checkCount, firstCheckRow: d.firstCheckRow, lastCheckRow: d.lastCheckRow })),
  );
  return { sheets: [summary, ...datasets.map((d) => d.sheet)] };
}
