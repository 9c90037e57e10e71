/** `base`, or `base 2`, `base 3`… : the first name no sheet has (Excel compares names without case). */
export function uniqueSheetName(base: string, taken: readonly string[]): string {
  const lower = new Set(taken.map((n) => n.toLowerCase()));
  if (!lower.has(base.toLowerCase())) return base;
  for (let k = 2; ; k++) {
    const name = `${base} ${k}`;
    if (!lower.has(name.toLowerCase())) return name;
  }
}
