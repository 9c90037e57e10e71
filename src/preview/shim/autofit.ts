/**
 * The width autofit gives a column, estimated from the length of the text it shows: the preview
 * has no text metrics outside a browser, and the estimate only has to make labels fit.
 */

/** The grid's 13 px system font averages about this many pixels a character. */
const CHARACTER_PX = 7.2;
const BOLD_FACTOR = 1.08;
/** The cell's padding and border. */
const PADDING_PX = 10;
/** Excel's widest column: 255 characters. */
const MAX_PX = 255 * CHARACTER_PX + PADDING_PX;

export interface ShownText {
  text: string;
  bold: boolean;
}

/** In points, whole pixels as Excel keeps widths; undefined when no cell shows anything. */
export function autofitWidth(cells: readonly ShownText[]): number | undefined {
  let widest = 0;
  for (const { text, bold } of cells) {
    if (text === '') continue;
    widest = Math.max(widest, [...text].length * CHARACTER_PX * (bold ? BOLD_FACTOR : 1) + PADDING_PX);
  }
  if (widest === 0) return undefined;
  return Math.ceil(Math.min(widest, MAX_PX)) * 0.75;
}
