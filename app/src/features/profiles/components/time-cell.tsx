import { Body1, Caption1, tokens } from '@fluentui/react-components';
import { formatUtcAndLocal } from '@/utils/format-time';

/** A time in UTC with the local time beneath (SPEC §6). */
export function TimeCell({ iso }: { iso: string | null | undefined }) {
  const time = formatUtcAndLocal(iso);
  if (!iso) return <Caption1>—</Caption1>;
  return (
    <span style={{ display: 'flex', flexDirection: 'column' }}>
      <Body1>{time.utc}</Body1>
      <Caption1 style={{ color: tokens.colorNeutralForeground3 }}>{time.localShort} local</Caption1>
    </span>
  );
}
