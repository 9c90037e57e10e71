import type { CellInput } from '../workbook/types';

/** What typed text becomes in a cell: a number, TRUE/FALSE, a formula or text; "" clears it. */
export function parseEntry(text: string): CellInput {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  if (trimmed.startsWith('=')) return trimmed;
  if (/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(trimmed)) return Number(trimmed);
  const upper = trimmed.toUpperCase();
  if (upper === 'TRUE' || upper === 'FALSE') return upper === 'TRUE';
  return text;
}
