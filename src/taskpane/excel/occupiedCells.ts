/** The addresses on `sheetName` among `addresses` (cells or ranges) that hold anything at all. */
export async function occupiedAddresses(sheetName: string, addresses: readonly string[]): Promise<string[]> {
  if (addresses.length === 0) return [];
  return Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    const ranges = addresses.map((address) => sheet.getRange(address).load('values'));
    await context.sync();
    return addresses.filter((_, i) => ranges[i].values.some((row) => row.some((v) => v !== '' && v !== null)));
  });
}
