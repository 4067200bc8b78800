export type SortDirection = 'ascending' | 'descending';

export interface SortState<K extends string> {
  column: K;
  direction: SortDirection;
}

/** The next sort state after a click on a column header: same column flips, another starts ascending. */
export function nextSort<K extends string>(current: SortState<K>, column: K): SortState<K> {
  if (current.column !== column) return { column, direction: 'ascending' };
  return { column, direction: current.direction === 'ascending' ? 'descending' : 'ascending' };
}

type SortValue = string | number | null | undefined;

/** A sorted copy: numbers numerically, strings by locale (case-insensitive); missing values last. */
export function sortRows<T, K extends string>(
  rows: readonly T[],
  sort: SortState<K>,
  valueOf: (row: T, column: K) => SortValue,
): T[] {
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return [...rows].sort((a, b) => {
    const x = valueOf(a, sort.column);
    const y = valueOf(b, sort.column);
    if (x === y) return 0;
    if (x === null || x === undefined) return 1;
    if (y === null || y === undefined) return -1;
    if (typeof x === 'number' && typeof y === 'number') return sign * (x - y);
    return (
      sign * String(x).localeCompare(String(y), undefined, { sensitivity: 'base', numeric: true })
    );
  });
}

/** Rows whose text contains the filter, ignoring case and surrounding spaces. */
export function filterRows<T>(rows: readonly T[], filter: string, textOf: (row: T) => string): T[] {
  const needle = filter.trim().toLocaleLowerCase();
  if (!needle) return [...rows];
  return rows.filter((row) => textOf(row).toLocaleLowerCase().includes(needle));
}
