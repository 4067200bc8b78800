import { Body1, Caption1 } from '@fluentui/react-components';
import { formatUtcAndLocal } from '@/utils/format-time';
import { useTableStyles } from './table-styles';

/** A time in UTC with the local time beneath (SPEC §6). */
export function TimeCell({ iso }: { iso: string | null | undefined }) {
  const styles = useTableStyles();
  const time = formatUtcAndLocal(iso);
  if (!iso) return <Caption1>—</Caption1>;
  return (
    <span className={styles.stack}>
      <Body1>{time.utc}</Body1>
      <Caption1 className={styles.muted}>{time.localShort} local</Caption1>
    </span>
  );
}
