import { makeStyles, tokens } from '@fluentui/react-components';

/** The look the list tables share: toolbar above, a raised card that scrolls sideways, a total below. */
export const useTableStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    justifyContent: 'space-between',
    marginBottom: tokens.spacingVerticalM,
  },
  wrapper: {
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  /** Secondary text in a cell: a caption under the main value. */
  muted: { color: tokens.colorNeutralForeground3 },
  /** A value with its caption underneath. */
  stack: { display: 'flex', flexDirection: 'column' },
  /** The row's buttons, side by side. */
  actions: {
    display: 'flex',
    flexWrap: 'nowrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  total: { marginTop: tokens.spacingVerticalS, color: tokens.colorNeutralForeground3 },
});
