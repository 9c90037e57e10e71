/**
 * Grouping rows by setting. Expected groups are worked by hand from the definition (rows equal in
 * every value, compared with ===): common practice (no source).
 */
import { describe, expect, it } from 'vitest';
import { settingGroups } from '../../../src/engine/infer/settingGroups';

function membersOf(rows: number[][]): number[][] {
  const p = rows[0]?.length ?? 0;
  const groups = settingGroups(Float64Array.from(rows.flat()), rows.length, p);
  return Array.from(groups.first, (start, g) => {
    const members: number[] = [];
    for (let i = start; i >= 0; i = groups.next[i]) members.push(i);
    expect(members.length).toBe(groups.sizes[g]);
    return members;
  });
}

describe('settingGroups', () => {
  it('groups equal rows, numbered by first row, members in row order', () => {
    const rows = [
      [1, 2],
      [3, 4],
      [1, 2],
      [2, 1],
      [3, 4],
      [1, 2],
    ];
    expect(membersOf(rows)).toEqual([[0, 2, 5], [1, 4], [3]]);
  });

  it('counts −0 and 0 as one value, and tells apart values one ulp apart', () => {
    expect(membersOf([[0], [-0], [1], [1 + Number.EPSILON]])).toEqual([[0, 1], [2], [3]]);
  });

  it('puts every row in one group when there are no predictors', () => {
    const groups = settingGroups(new Float64Array(0), 4, 0);
    expect(groups.count).toBe(1);
    expect(Array.from(groups.sizes)).toEqual([4]);
  });

  it('keeps thousands of distinct rows apart and finds their repeats', () => {
    const distinct = Array.from({ length: 3000 }, (_, i) => [i % 50, Math.floor(i / 50) * 0.1]);
    const groups = settingGroups(Float64Array.from([...distinct, ...distinct].flat()), 6000, 2);
    expect(groups.count).toBe(3000);
    expect(Array.from(groups.sizes).every((s) => s === 2)).toBe(true);
    expect(groups.next[0]).toBe(3000);
  });
});
