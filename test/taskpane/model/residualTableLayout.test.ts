/** The residual table's place on a values report, including a full sheet's worth of rows. */
import { describe, expect, it } from 'vitest';
import { headerAddresses, pieceAddress, tablePieces } from '../../../src/taskpane/model/residualTableLayout';

describe('residual table layout', () => {
  it('puts entries under the header in K:M, one row each', () => {
    expect(tablePieces(0, 3).map(pieceAddress)).toEqual(['K6:M8']);
    expect(headerAddresses(3)).toEqual(['K5:M5']);
  });

  it('continues a full sheet of data (1,048,575 rows) in a second panel, so no row passes the sheet’s last', () => {
    const pieces = tablePieces(0, 1_048_575);
    expect(pieces.map(pieceAddress)).toEqual(['K6:M1000005', 'O6:Q48580']);
    expect(pieces.reduce((sum, p) => sum + p.rows, 0)).toBe(1_048_575);
    expect(Math.max(...pieces.map((p) => p.top + p.rows))).toBeLessThanOrEqual(1_048_576);
    expect(headerAddresses(1_048_575)).toEqual(['K5:M5', 'O5:Q5']);
  });

  it('splits a block that straddles the panel boundary, keeping entry order', () => {
    const pieces = tablePieces(999_998, 4);
    expect(pieces.map((p) => [p.start, p.rows])).toEqual([
      [999_998, 2],
      [1_000_000, 2],
    ]);
    expect(pieces.map(pieceAddress)).toEqual(['K1000004:M1000005', 'O6:Q7']);
  });
});
