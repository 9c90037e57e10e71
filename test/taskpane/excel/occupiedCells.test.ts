/**
 * Refresh's check for cells typed since the report was written, against the strict preview host:
 * a tall range is read in blocks within the response limit (ResponsePayloadSizeLimitExceeded,
 * "Error handling with the application-specific JavaScript APIs"; lowered here so that a few
 * thousand rows cross it), single cells many to a request.
 */
import { describe, expect, it } from 'vitest';
import { occupiedAddresses } from '../../../src/taskpane/excel/occupiedCells';
import { freshHost } from '../../preview/shim/harness';

describe('occupiedAddresses against the strict host', () => {
  it('finds a note typed at the end of 20,000 rows of filled cells, and an empty cell as empty', async () => {
    const { model } = freshHost({ payloadLimitBytes: 100_000 });
    model.addSheet('Report');
    model.setInputs(
      'Report',
      4,
      10,
      Array.from({ length: 20_000 }, (_, i) => [i, i / 3, -i / 7]),
    );
    model.setInputs('Report', 30_004, 10, [['my note']]);
    const found = await occupiedAddresses('Report', ['A1', 'K5:M20004', 'K20005:M30004', 'K30005:M30005', 'B2']);
    expect(found).toEqual(['K5:M20004', 'K30005:M30005']);
  });
});
