import { Body1, Card, CardHeader, Subtitle1, makeStyles, tokens } from '@fluentui/react-components';
import type { Role } from '@hopwise/common';
import { LinkButton } from '@/components/link-button';
import type { NavItem } from '@/utils/nav-items';
import { roleLabel } from '@/utils/role-labels';
import { ROLE_SUMMARY } from './role-summary';

const useStyles = makeStyles({
  card: { padding: tokens.spacingHorizontalXL, gap: tokens.spacingVerticalM },
  list: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalXL,
    lineHeight: tokens.lineHeightBase400,
  },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
  muted: { color: tokens.colorNeutralForeground2 },
});

interface WelcomeCardProps {
  displayName: string;
  role: Role;
  areas: NavItem[];
}

export function WelcomeCard({ displayName, role, areas }: WelcomeCardProps) {
  const styles = useStyles();
  const summary = ROLE_SUMMARY[role];
  const shortcuts = areas.filter((area) => area.key !== 'dashboard');
  return (
    <Card className={styles.card} aria-labelledby="welcome-title">
      <CardHeader
        header={
          <Subtitle1 as="h2" id="welcome-title">
            Welcome, {displayName}
          </Subtitle1>
        }
        description={
          <Body1 className={styles.muted}>
            Signed in as {roleLabel(role)}. {summary.intro}
          </Body1>
        }
      />
      <ul className={styles.list}>
        {summary.tasks.map((task) => (
          <li key={task}>
            <Body1>{task}</Body1>
          </li>
        ))}
      </ul>
      <nav aria-label="Shortcuts" className={styles.actions}>
        {shortcuts.map((area) => (
          <LinkButton key={area.key} to={area.href} appearance="secondary">
            Open {area.label}
          </LinkButton>
        ))}
      </nav>
    </Card>
  );
}
