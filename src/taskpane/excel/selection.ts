/** The address of the user's current selection, sheet included, as Excel writes it. */
export async function selectedAddress(): Promise<string> {
  return Excel.run(async (context) => {
    const range = context.workbook.getSelectedRange();
    range.load('address');
    await context.sync();
    return range.address;
  });
}
