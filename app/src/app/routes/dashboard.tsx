import { makeStyles, tokens } from '@fluentui/react-components';
import { PageHeader } from '@/components/page-header';
import { useUser } from '@/features/auth/api/get-user';
import { SafetyNotes } from '@/features/dashboard/components/safety-notes';
import { WelcomeCard } from '@/features/dashboard/components/welcome-card';
import { LinkStudyCards } from '@/features/links/components/link-study-cards';
import { navItemsFor } from '@/utils/nav-items';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(320px, 100%), 1fr))',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
  },
});

export default function DashboardRoute() {
  const styles = useStyles();
  const { data: user } = useUser();
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Dashboard"
        description="Where your links, profiles, nets and notices come together."
      />
      <div className={styles.grid}>
        <WelcomeCard
          displayName={user.displayName}
          role={user.role}
          areas={navItemsFor(user.role)}
        />
        <SafetyNotes />
      </div>
      <LinkStudyCards />
    </>
  );
}
