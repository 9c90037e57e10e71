/**
 * Colours as Excel's API takes them: "#RRGGBB", "RRGGBB" or an HTML colour name, read back as
 * "#RRGGBB" in capitals. Only the common names are known here; others are refused rather than
 * guessed.
 */
const NAMED: Record<string, string> = {
  aqua: '#00FFFF',
  black: '#000000',
  blue: '#0000FF',
  fuchsia: '#FF00FF',
  gray: '#808080',
  green: '#008000',
  grey: '#808080',
  lightgray: '#D3D3D3',
  lightgrey: '#D3D3D3',
  lime: '#00FF00',
  maroon: '#800000',
  navy: '#000080',
  olive: '#808000',
  orange: '#FFA500',
  purple: '#800080',
  red: '#FF0000',
  silver: '#C0C0C0',
  teal: '#008080',
  white: '#FFFFFF',
  yellow: '#FFFF00',
};

/** The colour as '#RRGGBB', or undefined when it is not one the preview understands. */
export function normalizeColor(color: unknown): string | undefined {
  if (typeof color !== 'string') return undefined;
  const text = color.trim();
  const hex = /^#?([0-9a-f]{6})$/i.exec(text);
  if (hex) return `#${hex[1].toUpperCase()}`;
  return NAMED[text.toLowerCase()];
}
