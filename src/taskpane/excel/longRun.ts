/**
 * Excel.run for work that takes more than a moment (full reads, report writes, freezing,
 * refreshing). Without `delayForCellEdit` a batch that reaches Excel while the user is editing a
 * cell fails ("Excel.RunOptions", delayForCellEdit: "When false, if the user is in cell edit when
 * the batch request is processed by the host, the batch automatically fails"), so a user typing
 * during a read of tens of seconds would end it half way. With it, Excel holds the batch until the
 * edit ends.
 */
export function longRun<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T> {
  return Excel.run({ delayForCellEdit: true }, batch);
}
