import { Caption1 } from '@fluentui/react-components';
import { useTableStyles } from './table-styles';

interface FilteredTotalProps {
  /** Rows the filter lets through. */
  shown: number;
  /** Rows loaded. */
  loaded: number;
  /** Rows the server holds. */
  total: number;
  filter: string;
  /** The row's noun, singular and plural: ['link', 'links']. */
  noun: readonly [string, string];
}

/** Under a filtered table: "3 links", or "2 of 3 links match “x”" while the filter hides some. */
export function FilteredTotal({
  shown,
  loaded,
  total,
  filter,
  noun: [one, many],
}: FilteredTotalProps) {
  const styles = useTableStyles();
  return (
    <Caption1 as="p" className={styles.total}>
      {shown === loaded
        ? `${total} ${total === 1 ? one : many}`
        : `${shown} of ${loaded} ${many} match “${filter.trim()}”`}
    </Caption1>
  );
}
