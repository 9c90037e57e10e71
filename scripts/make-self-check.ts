/**
 * Writes assets/plumbline-self-check.xlsx, the workbook a user opens in Excel with the add-in
 * loaded to see whether this installation computes correctly (README, "Self-check in your Excel").
 * Needs the NIST StRD files in ../shared/reference/strd beside the repository; R is not needed
 * (the ToothGrowth reference values are committed in scripts/selfCheck/toothGrowth.json).
 * Run: npm run self-check
 */
import { writeFileSync } from 'node:fs';
import { relative } from 'node:path';
import { buildSelfCheckPlan, REPOSITORY_ROOT, SELF_CHECK_WORKBOOK } from './selfCheck/buildPlan';
import { writeSelfCheckXlsx } from './selfCheck/writeXlsx';

async function main(): Promise<void> {
  const plan = buildSelfCheckPlan();
  writeFileSync(SELF_CHECK_WORKBOOK, await writeSelfCheckXlsx(plan));
  console.log(`Wrote ${relative(REPOSITORY_ROOT, SELF_CHECK_WORKBOOK)} with the sheets ${plan.sheets.map((s) => s.name).join(', ')}.`);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
