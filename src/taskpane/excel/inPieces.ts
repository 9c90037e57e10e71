import { isPayloadLimit, PAYLOAD_BUDGET_BYTES, piecesWithin } from './payload';

/**
 * Runs `count` units (rows to write, cells to write, ranges to read) as consecutive pieces whose
 * estimated bytes fit the budget, one request each, in order, each awaited before the next starts.
 * A piece Excel rejects as too large runs again as two halves; any other failure stops everything.
 */
export async function inPieces(
  count: number,
  bytesOf: (index: number) => number,
  run: (start: number, count: number) => Promise<void>,
  budget = PAYLOAD_BUDGET_BYTES,
): Promise<void> {
  const runHalving = async (start: number, units: number): Promise<void> => {
    try {
      await run(start, units);
    } catch (error) {
      if (!isPayloadLimit(error) || units <= 1) throw error;
      const half = Math.floor(units / 2);
      await runHalving(start, half);
      await runHalving(start + half, units - half);
    }
  };
  for (const piece of piecesWithin(count, bytesOf, budget)) await runHalving(piece.start, piece.count);
}
