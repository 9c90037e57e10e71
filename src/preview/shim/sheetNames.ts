/** Excel's rules for a worksheet name: 1–31 characters, none of : \ / ? * [ ], no quote at either end. */
export function isValidSheetName(name: string): boolean {
  return name.length >= 1 && name.length <= 31 && !/[:\\/?*[\]]/.test(name) && !name.startsWith("'") && !name.endsWith("'");
}
