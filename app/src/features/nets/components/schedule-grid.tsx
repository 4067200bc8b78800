import type { ScheduleSlot } from '@hopwise/common';
import { Button, Caption1, makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { formatUtcAndLocal } from '@/utils/format-time';

/**
 * The 24-hour grid: one row per slot (UTC with local beside), one column per channel. Each cell
 * says what the channel is in that slot with a shape AND a word (never colour alone):
 *   ◆ in force   the channel the net uses (the best one, or the controller's override)
 *   ◇ best       the computed best channel when an override is in force instead
 *   ○ usable     at or below the MUF on every member path
 *   ╳ above MUF  above the MUF on at least one member path
 */
const useStyles = makeStyles({
  wrap: { overflowX: 'auto', maxWidth: '100%' },
  table: { borderCollapse: 'separate', borderSpacing: '2px', fontSize: tokens.fontSizeBase200 },
  th: {
    textAlign: 'left',
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalS}`,
    position: 'sticky',
    top: 0,
    backgroundColor: tokens.colorNeutralBackground1,
    whiteSpace: 'nowrap',
  },
  time: { whiteSpace: 'nowrap', padding: `0 ${tokens.spacingHorizontalS}` },
  muf: {
    whiteSpace: 'nowrap',
    padding: `0 ${tokens.spacingHorizontalS}`,
    fontVariantNumeric: 'tabular-nums',
  },
  cell: {
    minWidth: '92px',
    padding: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalXS}`,
    borderRadius: tokens.borderRadiusMedium,
    textAlign: 'left',
    whiteSpace: 'nowrap',
  },
  inForce: {
    backgroundColor: tokens.colorBrandBackground,
    color: tokens.colorNeutralForegroundOnBrand,
    fontWeight: tokens.fontWeightSemibold,
  },
  best: { outline: `2px dashed ${tokens.colorBrandStroke1}`, outlineOffset: '-2px' },
  usable: { backgroundColor: tokens.colorNeutralBackground3 },
  closed: { color: tokens.colorNeutralForeground4, textDecorationLine: 'line-through' },
  cellButton: {
    minWidth: '92px',
    justifyContent: 'flex-start',
    fontWeight: 'inherit',
    color: 'inherit',
  },
  overridden: { fontStyle: 'italic' },
});

type CellState = 'inForce' | 'best' | 'usable' | 'closed';
const MARK: Record<CellState, string> = {
  inForce: '◆ in force',
  best: '◇ best',
  usable: '○ usable',
  closed: '╳ above MUF',
};

function cellState(slot: ScheduleSlot, kHz: number): CellState {
  if (slot.channelKHz === kHz) return 'inForce';
  if (slot.bestChannelKHz === kHz) return 'best';
  return slot.usableChannelsKHz.includes(kHz) ? 'usable' : 'closed';
}

interface ScheduleGridProps {
  slots: ScheduleSlot[];
  channelsKHz: number[];
  caption: string;
  /** When given, each cell is a button that puts that channel in force for the slot. */
  onOverride?: (slot: ScheduleSlot, channelKHz: number | null) => void;
  busy?: boolean;
}

export function ScheduleGrid({ slots, channelsKHz, caption, onOverride, busy }: ScheduleGridProps) {
  const styles = useStyles();
  return (
    <div className={styles.wrap}>
      <table className={styles.table}>
        <caption style={{ textAlign: 'left' }}>
          <Caption1>{caption}</Caption1>
        </caption>
        <thead>
          <tr>
            <th scope="col" className={styles.th}>
              Slot (UTC / local)
            </th>
            <th scope="col" className={styles.th}>
              MUF / OWF
            </th>
            {channelsKHz.map((c) => (
              <th key={c} scope="col" className={styles.th}>
                {c} kHz
              </th>
            ))}
            {onOverride && (
              <th scope="col" className={styles.th}>
                Override
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {slots.map((slot) => {
            const t = formatUtcAndLocal(slot.startUtc);
            const utcTime = t.utc.slice(11);
            return (
              <tr key={slot.startUtc}>
                <th scope="row" className={styles.time}>
                  {utcTime} <Caption1>({t.localShort} local)</Caption1>
                </th>
                <td className={styles.muf}>
                  {slot.mufMHz === null
                    ? 'no path'
                    : `${slot.mufMHz.toFixed(1)} / ${(slot.owfMHz ?? 0).toFixed(1)} MHz`}
                </td>
                {channelsKHz.map((c) => {
                  const state = cellState(slot, c);
                  const text = MARK[state];
                  const cls = mergeClasses(
                    styles.cell,
                    styles[state],
                    state === 'inForce' && slot.overridden ? styles.overridden : undefined,
                  );
                  const label = `${c} kHz at ${utcTime}: ${text.slice(2)}${
                    state === 'inForce' && slot.overridden ? ' (override)' : ''
                  }`;
                  return (
                    <td key={c} className={cls}>
                      {onOverride ? (
                        <Button
                          appearance={state === 'inForce' ? 'primary' : 'subtle'}
                          size="small"
                          className={styles.cellButton}
                          aria-label={`${label}. Put ${c} kHz in force for this slot`}
                          aria-pressed={state === 'inForce'}
                          onClick={() => !busy && onOverride(slot, c)}
                        >
                          {text}
                        </Button>
                      ) : (
                        <span aria-label={label}>{text}</span>
                      )}
                    </td>
                  );
                })}
                {onOverride && (
                  <td>
                    {slot.overridden ? (
                      <Button
                        size="small"
                        aria-label={`Clear the override at ${utcTime}`}
                        onClick={() => !busy && onOverride(slot, null)}
                      >
                        Use best
                      </Button>
                    ) : (
                      <Caption1>
                        {slot.channelKHz === null ? 'no channel at or below the OWF' : 'computed'}
                      </Caption1>
                    )}
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
