import { makeStyles } from '@fluentui/react-components';
import { useState } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { FullPageSpinner } from '@/components/full-page-spinner';
import { AppShell } from '@/components/layouts/app-shell';
import { QueryErrorBar } from '@/components/query-state-boundary';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-user';
import { useLogout } from '@/features/auth/api/logout';
import { NoticesNavBadge } from '@/features/notices/components/notices-nav-badge';
import { getToken } from '@/lib/auth-token';
import { navItemsFor } from '@/utils/nav-items';

const useStyles = makeStyles({
  center: { minHeight: '100vh', display: 'grid', placeItems: 'center', padding: '24px' },
});

/** Signed-in area: loads the user, shows the shell, sends everyone else to sign-in. */
export default function AppRoot() {
  const styles = useStyles();
  const location = useLocation();
  const [signedOut, setSignedOut] = useState(false);
  const logout = useLogout();
  const user = useUser();
  const here = location.pathname + location.search;

  // After an explicit sign-out there is no page to come back to.
  if (!getToken()) {
    return <Navigate to={paths.signIn.getHref(signedOut ? null : here)} replace />;
  }

  if (user.isPending) return <FullPageSpinner label="Loading your account…" />;

  if (user.isError) {
    return (
      <div className={styles.center}>
        <QueryErrorBar
          title="Could not load your account"
          error={user.error}
          onRetry={() => void user.refetch()}
        />
      </div>
    );
  }

  if (!user.data) return <Navigate to={paths.signIn.getHref(here)} replace />;

  const onSignOut = () => {
    setSignedOut(true);
    logout();
  };

  return (
    <AppShell
      user={user.data}
      navItems={navItemsFor(user.data.role)}
      onSignOut={onSignOut}
      navBadges={{ notices: <NoticesNavBadge /> }}
    >
      <Outlet />
    </AppShell>
  );
}
