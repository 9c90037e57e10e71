// R's side of the live report (issue #15): the sheet's numbers written to a file that
// liveReportTime.R reads with readBin, and its step-by-step medians read back.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type LiveSheet, NEW_ROWS } from './liveSheet';

export const R_STEPS = ['lm, summary, confint', 'anova (nested)', 'predict', 'influence.measures', 'dwtest', 'bptest', 'qqnorm', 'vif'] as const;

export interface RAnalysis {
  medianMs: number;
  stepMs: number[];
  dwExact: boolean;
}

export function rAnalysis(sheet: LiveSheet, repeats: number): RAnalysis {
  const { rows, predictors } = sheet.shape;
  const dir = mkdtempSync(join(tmpdir(), 'plumbline-live-'));
  const file = join(dir, 'sheet.bin');
  try {
    const values = new Float64Array(rows * (predictors + 1));
    values.set(sheet.y, 0);
    values.set(sheet.x, rows);
    writeFileSync(file, new Uint8Array(values.buffer));
    const output = execFileSync(
      'Rscript',
      [join(__dirname, 'liveReportTime.R'), file, String(rows), String(predictors), String(sheet.baseColumns), String(NEW_ROWS), String(repeats)],
      { encoding: 'utf8' },
    );
    const [exact, total, ...steps] = output.trim().split(/\s+/);
    return { dwExact: exact === 'TRUE', medianMs: Number(total) * 1000, stepMs: steps.map((s) => Number(s) * 1000) };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
