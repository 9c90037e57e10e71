import type { ResolvedRanges } from '../model/choices';

/** The sheets the read ranges lie on, each once. */
export function sheetsOf(ranges: ResolvedRanges): string[] {
  const all = [ranges.response, ...ranges.predictorColumns, ...(ranges.weights === undefined ? [] : [ranges.weights]), ...(ranges.newRows ?? [])];
  return [...new Set(all.map((range) => range.sheet))];
}

/**
 * Calls onChange after cells on any of these sheets change (Worksheet.onChanged, "Work with
 * events using the Excel JavaScript API"), so the pane can say its results may be out of date.
 * Returns the function that stops watching, removing the handlers through their own context as
 * that page shows.
 */
export async function watchSheets(sheets: readonly string[], onChange: () => void): Promise<() => Promise<void>> {
  const handlers = await Excel.run(async (context) => {
    const added = sheets.map((name) =>
      context.workbook.worksheets.getItem(name).onChanged.add(async () => {
        onChange();
      }),
    );
    await context.sync();
    return added;
  });
  return async () => {
    const [first] = handlers;
    if (first === undefined) return;
    await Excel.run(first.context, async (context) => {
      handlers.forEach((handler) => handler.remove());
      await context.sync();
    });
  };
}
