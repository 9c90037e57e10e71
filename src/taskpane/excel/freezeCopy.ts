import { REPORT_TITLE_PREFIX } from '../model/reportPlan';
import { uniqueSheetName } from './uniqueSheetName';

/**
 * Writes a values-only copy of the active report sheet for colleagues without the add-in (in
 * whose Excel the PLUMB formulas would show #NAME?). Every string is written under the text
 * format, so nothing copied can turn into a formula; the stamp says what it is and when.
 */
export async function freezeActiveReport(now: Date): Promise<string> {
  return Excel.run(async (context) => {
    const report = context.workbook.worksheets.getActiveWorksheet();
    const title = report.getRange('A1');
    const used = report.getUsedRange(true);
    const sheets = context.workbook.worksheets;
    report.load('name');
    title.load('values');
    used.load('values, numberFormat, rowCount, columnCount');
    sheets.load('items/name');
    await context.sync();
    const heading = String(title.values[0][0]);
    if (!heading.startsWith(REPORT_TITLE_PREFIX)) {
      throw new Error('Open a Plumbline report sheet first: the copy is made of the active report.');
    }
    const name = uniqueSheetName(`${report.name} values`.slice(0, 31), sheets.items.map((s) => s.name));
    const copy = sheets.add(name);
    await context.sync();
    try {
      const stamp = copy.getRange('A1:A2');
      stamp.numberFormat = [['@'], ['@']];
      stamp.values = [
        [`Frozen copy of "${report.name}" made ${now.toISOString().slice(0, 16).replace('T', ' ')} UTC: values only, no live formulas.`],
        [heading],
      ];
      copy.getRange('A1').format.font.bold = true;
      const target = copy.getRange('A4').getResizedRange(used.rowCount - 1, used.columnCount - 1);
      target.numberFormat = used.values.map((row, i) => row.map((v, j) => (typeof v === 'string' ? '@' : used.numberFormat[i][j])));
      target.values = used.values;
      copy.getRange('A1').format.columnWidth = 170;
      copy.activate();
      await context.sync();
      return name;
    } catch (error) {
      copy.delete();
      await context.sync();
      throw error;
    }
  });
}
