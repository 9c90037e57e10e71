/** Helpers to shape numbers as Excel hands ranges to custom functions: row-major any[][]. */
export function column(header: string | undefined, values: readonly unknown[]): unknown[][] {
  return [...(header === undefined ? [] : [[header]]), ...values.map((v) => [v])];
}

export function columns(headers: readonly string[] | undefined, rows: readonly (readonly unknown[])[]): unknown[][] {
  return [...(headers === undefined ? [] : [[...headers]]), ...rows.map((r) => [...r])];
}

/** Calls a cell function and returns what it threw, or fails the test if it returned. */
export function thrownBy(call: () => unknown): { code: string; message: string } {
  try {
    call();
  } catch (error) {
    const e = error as { code?: unknown; message?: unknown };
    return { code: String(e.code), message: String(e.message) };
  }
  throw new Error('expected the cell function to return an error');
}
