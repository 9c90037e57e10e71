import type { CellValue } from './types';

/**
 * How a cell's value reads on screen under its number format, after Microsoft Support, "Review
 * guidelines for customizing a number format" (sections, quoted text, conditions). Only the codes
 * Plumbline writes are interpreted: General; digit patterns with fixed decimals ("0.000",
 * "#,##0.00"), percent ("0.0%") and scientific ("0.00E+00"); text in quotes or after a backslash;
 * up to four sections (positive;negative;zero;text); and conditions in square brackets, such as
 * the p-value format '[<0.0001]"<0.0001";0.0000'. Anything else, and any case the page leaves
 * open (a negative number in a format with conditions), shows as General.
 */
export function formatValue(value: CellValue, numberFormat: string): string {
  if (value === null) return '';
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return value;
  if (typeof value === 'object') return value.error;
  return formatNumber(value, numberFormat);
}

export function formatNumber(value: number, numberFormat: string): string {
  const format = numberFormat.trim();
  if (format === '' || format.toLowerCase() === 'general') return general(value);
  const sections = splitSections(format)?.map(parseSection);
  if (sections === undefined || sections.some((section) => section === undefined)) return general(value);
  const chosen = chooseSection(sections as Section[], value);
  return chosen === undefined ? general(value) : render(chosen.section, chosen.value);
}

/** One piece of a section: text shown as it is, or the digit pattern the number fills. */
type Piece = { text: string } | { pattern: string };

interface Condition {
  operator: '<' | '<=' | '>' | '>=' | '=' | '<>';
  limit: number;
}

interface Section {
  condition: Condition | undefined;
  pieces: Piece[];
}

/** The sections of a code, split at semicolons outside quotes, brackets and escapes; undefined past four. */
function splitSections(format: string): string[] | undefined {
  const sections: string[] = [];
  let current = '';
  for (let i = 0; i < format.length; i++) {
    const c = format[i];
    if (c === '"') {
      const end = format.indexOf('"', i + 1);
      if (end < 0) return undefined;
      current += format.slice(i, end + 1);
      i = end;
    } else if (c === '\\') {
      current += format.slice(i, i + 2);
      i++;
    } else if (c === '[') {
      const end = format.indexOf(']', i + 1);
      if (end < 0) return undefined;
      current += format.slice(i, end + 1);
      i = end;
    } else if (c === ';') {
      sections.push(current);
      current = '';
    } else current += c;
  }
  sections.push(current);
  return sections.length <= 4 ? sections : undefined;
}

const CONDITION = /^(<=|>=|<>|<|>|=)\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)$/;
const COLOURS = /^(black|blue|cyan|green|magenta|red|white|yellow|color\s*\d{1,2})$/i;
/** Characters shown without quotes (the page's list of characters displayed as they are). */
const PLAIN = new Set(['$', '+', '(', ':', '^', "'", '{', '<', '=', '-', '/', ')', '!', '&', '~', '}', '>', ' ']);
const DIGIT_RUN = /^(?:[0#.,%]|[eE][+-])+/;

/** A section's condition and pieces; undefined for a code outside what formatValue interprets. */
function parseSection(code: string): Section | undefined {
  let condition: Condition | undefined;
  const pieces: Piece[] = [];
  const text = (t: string) => {
    const last = pieces[pieces.length - 1];
    if (last !== undefined && 'text' in last) last.text += t;
    else pieces.push({ text: t });
  };
  for (let i = 0; i < code.length; i++) {
    const c = code[i];
    if (c === '"') {
      const end = code.indexOf('"', i + 1);
      text(code.slice(i + 1, end));
      i = end;
    } else if (c === '\\') {
      text(code[i + 1] ?? '');
      i++;
    } else if (c === '[') {
      const end = code.indexOf(']', i + 1);
      const inside = code.slice(i + 1, end);
      i = end;
      const match = CONDITION.exec(inside);
      if (match !== null && condition === undefined) condition = { operator: match[1] as Condition['operator'], limit: Number(match[2]) };
      else if (!COLOURS.test(inside)) return undefined;
    } else if (DIGIT_RUN.test(code.slice(i))) {
      // The number's digit pattern is one run ("E+" and "E-" belong to it); a second run is not interpreted.
      const run = DIGIT_RUN.exec(code.slice(i))?.[0] ?? '';
      if (pieces.some((p) => 'pattern' in p)) return undefined;
      pieces.push({ pattern: run });
      i += run.length - 1;
    } else if (PLAIN.has(c)) text(c);
    else return undefined;
  }
  return { condition, pieces };
}

function meets(value: number, { operator, limit }: Condition): boolean {
  switch (operator) {
    case '<':
      return value < limit;
    case '<=':
      return value <= limit;
    case '>':
      return value > limit;
    case '>=':
      return value >= limit;
    case '=':
      return value === limit;
    case '<>':
      return value !== limit;
  }
}

/**
 * The section a number takes and the value it shows. Without conditions: one section for every
 * number (negatives with a minus sign), or positive-and-zero;negative, or positive;negative;zero,
 * the negative section showing the number without its sign. With conditions: the first section
 * whose condition holds, else the first section without one.
 */
function chooseSection(all: Section[], value: number): { section: Section; value: number } | undefined {
  const numeric = all.length === 4 ? all.slice(0, 3) : all;
  if (numeric.some((s) => s.condition !== undefined)) {
    const section = numeric.find((s) => s.condition === undefined || meets(value, s.condition));
    if (section === undefined) return undefined;
    const showsDigits = section.pieces.some((p) => 'pattern' in p);
    // Whether a negative number keeps its sign here the page does not say: not interpreted.
    return value < 0 && showsDigits ? undefined : { section, value };
  }
  if (numeric.length === 1 || value > 0 || (value === 0 && numeric.length === 2)) return { section: numeric[0], value };
  if (value < 0) return { section: numeric[1], value: -value };
  return { section: numeric[2], value };
}

function render(section: Section, value: number): string {
  let out = '';
  for (const piece of section.pieces) {
    if ('text' in piece) out += piece.text;
    else {
      const digits = fillPattern(piece.pattern, value);
      if (digits === undefined) return general(value);
      out += digits;
    }
  }
  return out;
}

function decimalsOf(pattern: string): number {
  const dot = pattern.indexOf('.');
  if (dot < 0) return 0;
  let n = 0;
  for (let i = dot + 1; i < pattern.length && (pattern[i] === '0' || pattern[i] === '#'); i++) n++;
  return n;
}

/** The number in one digit pattern: "0.00", "#,##0", "0.0%", "0.00E+00". */
function fillPattern(pattern: string, value: number): string | undefined {
  const exponent = /^0(\.0+)?E\+0+$/i.exec(pattern);
  if (exponent !== null) return scientific(value, decimalsOf(pattern));
  const plain = /^(#,##)?0(\.0+)?(%?)$/.exec(pattern);
  if (plain === null) return undefined;
  const scaled = plain[3] === '%' ? value * 100 : value;
  const fixed = scaled.toFixed(decimalsOf(pattern));
  return `${plain[1] === '#,##' ? withThousands(fixed) : fixed}${plain[3]}`;
}

function withThousands(fixed: string): string {
  const [whole, fraction] = fixed.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return fraction === undefined ? grouped : `${grouped}.${fraction}`;
}

function scientific(value: number, decimals: number): string {
  const [mantissa, exponent] = value.toExponential(decimals).split('e');
  const e = Number(exponent);
  return `${mantissa}E${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`;
}

/** Characters a General number may take: what a standard-width column shows. */
export const GENERAL_WIDTH = 11;

/**
 * As many significant digits as fit in a standard column, switching to scientific notation for
 * numbers too large or too small to show that way. The full value stays in the cell.
 */
function general(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude < 1e11 && magnitude >= 1e-4) {
    for (let digits = 10; digits >= 1; digits--) {
      const text = String(Number(value.toPrecision(digits)));
      if (text.length <= GENERAL_WIDTH && !text.includes('e')) return text;
    }
  }
  for (let decimals = 5; decimals >= 0; decimals--) {
    const text = scientific(value, decimals).replace(/\.?0+E/, 'E');
    if (text.length <= GENERAL_WIDTH) return text;
  }
  return scientific(value, 0);
}
