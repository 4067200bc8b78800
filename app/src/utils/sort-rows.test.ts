import { describe, expect, it } from 'vitest';
import { filterRows, nextSort, sortRows } from './sort-rows';

const rows = [
  { name: 'beta', km: 10 },
  { name: 'Alpha', km: 900 },
  { name: 'gamma', km: undefined as number | undefined },
  { name: 'delta 2', km: 85 },
  { name: 'delta 10', km: 85 },
];

describe('sortRows', () => {
  it('sorts text case-insensitively with numbers inside names in numeric order', () => {
    const sorted = sortRows(rows, { column: 'name', direction: 'ascending' }, (r, c) =>
      c === 'name' ? r.name : r.km,
    );
    expect(sorted.map((r) => r.name)).toEqual(['Alpha', 'beta', 'delta 2', 'delta 10', 'gamma']);
  });

  it('sorts numbers numerically, descending, with missing values last', () => {
    const sorted = sortRows(rows, { column: 'km', direction: 'descending' }, (r, c) =>
      c === 'km' ? r.km : r.name,
    );
    expect(sorted.map((r) => r.km)).toEqual([900, 85, 85, 10, undefined]);
  });
});

describe('nextSort', () => {
  it('flips the direction on the same column and starts ascending on another', () => {
    expect(nextSort({ column: 'a', direction: 'ascending' }, 'a').direction).toBe('descending');
    expect(nextSort({ column: 'a', direction: 'descending' }, 'b')).toEqual({
      column: 'b',
      direction: 'ascending',
    });
  });
});

describe('filterRows', () => {
  it('keeps rows containing the text, ignoring case', () => {
    expect(filterRows(rows, '  DELTA ', (r) => r.name)).toHaveLength(2);
    expect(filterRows(rows, '', (r) => r.name)).toHaveLength(5);
  });
});
