import { Body1, Card, Title2, makeStyles, tokens } from '@fluentui/react-components';
import { useEffect } from 'react';
import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { HopwiseMark } from '@/components/hopwise-mark';
import { ThemeToggle } from '@/components/theme/theme-toggle';
import { safeNextPath } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-user';
import { DemoAccountsHint } from '@/features/auth/components/demo-accounts-hint';
import { SignInForm } from '@/features/auth/components/sign-in-form';

const useStyles = makeStyles({
  page: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    justifyContent: 'center',
    gap: tokens.spacingVerticalL,
    padding: tokens.spacingHorizontalL,
    boxSizing: 'border-box',
    backgroundImage: `radial-gradient(ellipse at top, ${tokens.colorBrandBackground2} 0%, transparent 60%)`,
  },
  toggle: { position: 'absolute', top: tokens.spacingVerticalM, right: tokens.spacingHorizontalM },
  card: {
    width: '100%',
    maxWidth: '420px',
    padding: tokens.spacingHorizontalXXL,
    gap: tokens.spacingVerticalL,
  },
  brand: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM },
  brandText: { display: 'flex', flexDirection: 'column' },
  tagline: { color: tokens.colorNeutralForeground2, margin: 0 },
  hint: { width: '100%', maxWidth: '420px' },
});

export default function SignInRoute() {
  const styles = useStyles();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const user = useUser();

  useEffect(() => {
    document.title = 'Sign in · Hopwise';
  }, []);

  if (user.data) return <Navigate to={next} replace />;

  return (
    <main className={styles.page}>
      <div className={styles.toggle}>
        <ThemeToggle />
      </div>
      <Card className={styles.card}>
        <div className={styles.brand}>
          <HopwiseMark size={44} />
          <div className={styles.brandText}>
            <Title2 as="h1">Sign in to Hopwise</Title2>
            <Body1 as="p" className={styles.tagline}>
              HF sky-wave link planning
            </Body1>
          </div>
        </div>
        <SignInForm onSuccess={() => navigate(next, { replace: true })} />
      </Card>
      <div className={styles.hint}>
        <DemoAccountsHint />
      </div>
    </main>
  );
}
