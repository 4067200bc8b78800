import { TableHeaderCell } from '@fluentui/react-components';
import { useState } from 'react';
import { nextSort, type SortState } from '@/utils/sort-rows';

/**
 * The sort state of a table sorted by one column at a time, starting ascending on `initial`, and
 * `header(column, label)` for a header cell that shows and toggles it.
 */
export function useSortableHeader<C extends string>(initial: C) {
  const [sort, setSort] = useState<SortState<C>>({ column: initial, direction: 'ascending' });
  const header = (column: C, label: string) => (
    <TableHeaderCell
      sortDirection={sort.column === column ? sort.direction : undefined}
      onClick={() => setSort((current) => nextSort(current, column))}
    >
      {label}
    </TableHeaderCell>
  );
  return { sort, header };
}
