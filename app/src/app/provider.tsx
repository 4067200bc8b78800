import { FluentProvider, Spinner, Toaster, makeStyles, tokens } from '@fluentui/react-components';
import { QueryClientProvider } from '@tanstack/react-query';
import { Suspense, useMemo, type ReactNode } from 'react';
import { themeFor } from '@/components/theme/hopwise-theme';
import { ThemeModeContext } from '@/components/theme/theme-mode-context';
import { TOASTER_ID } from '@/hooks/use-notify';
import { useThemeMode } from '@/hooks/use-theme-mode';
import { queryClient } from '@/lib/react-query';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    backgroundColor: tokens.colorNeutralBackground2,
    color: tokens.colorNeutralForeground1,
  },
  fallback: { minHeight: '100vh', display: 'grid', placeItems: 'center' },
});

export function AppProvider({ children }: { children: ReactNode }) {
  const styles = useStyles();
  const { mode, toggle } = useThemeMode();
  const themeMode = useMemo(() => ({ mode, toggle }), [mode, toggle]);

  return (
    <QueryClientProvider client={queryClient}>
      <ThemeModeContext.Provider value={themeMode}>
        {/* No className on the provider: Fluent copies it onto portal mount nodes (toasts, dialogs). */}
        <FluentProvider theme={themeFor(mode)}>
          <div className={styles.root}>
            <Suspense
              fallback={
                <div className={styles.fallback}>
                  <Spinner label="Loading Hopwise…" />
                </div>
              }
            >
              {children}
            </Suspense>
          </div>
          <Toaster toasterId={TOASTER_ID} position="bottom-end" pauseOnHover pauseOnWindowBlur />
        </FluentProvider>
      </ThemeModeContext.Provider>
    </QueryClientProvider>
  );
}
