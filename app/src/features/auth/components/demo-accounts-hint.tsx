import {
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  makeStyles,
  tokens,
} from '@fluentui/react-components';

const DEMO_ACCOUNTS = [
  { email: 'operator@hopwise.test', role: 'operator' },
  { email: 'netcontrol@hopwise.test', role: 'net control' },
  { email: 'analyst@hopwise.test', role: 'analyst' },
  { email: 'admin@hopwise.test', role: 'admin' },
] as const;

const useStyles = makeStyles({
  list: {
    margin: `${tokens.spacingVerticalXS} 0`,
    paddingLeft: tokens.spacingHorizontalL,
  },
  code: { fontFamily: tokens.fontFamilyMonospace },
});

/** The seeded demo accounts (SPEC §3): for trying Hopwise out, never for real use. */
export function DemoAccountsHint() {
  const styles = useStyles();
  return (
    <MessageBar intent="info" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>Demo accounts (demo only)</MessageBarTitle>
        <span>
          A fresh demo installation has one account per role, all with the password{' '}
          <code className={styles.code}>hopwise-demo</code>:
        </span>
        <ul className={styles.list}>
          {DEMO_ACCOUNTS.map((account) => (
            <li key={account.email}>
              <code className={styles.code}>{account.email}</code> — {account.role}
            </li>
          ))}
        </ul>
        <span>They exist only for trying Hopwise out; disable them on a real installation.</span>
      </MessageBarBody>
    </MessageBar>
  );
}
