import { useCallback, useEffect, useState } from 'react';
import type { ThemeMode } from '@/components/theme/hopwise-theme';

const STORAGE_KEY = 'hopwise.theme';
const DARK_QUERY = '(prefers-color-scheme: dark)';

function storedMode(): ThemeMode | null {
  const value = localStorage.getItem(STORAGE_KEY);
  return value === 'light' || value === 'dark' ? value : null;
}

function systemMode(): ThemeMode {
  return window.matchMedia?.(DARK_QUERY).matches ? 'dark' : 'light';
}

/**
 * Light or dark: follows the system's prefers-color-scheme until the user picks one with the
 * toggle; the pick is kept in localStorage.
 */
export function useThemeMode(): { mode: ThemeMode; toggle: () => void } {
  const [override, setOverride] = useState<ThemeMode | null>(storedMode);
  const [system, setSystem] = useState<ThemeMode>(systemMode);

  useEffect(() => {
    const query = window.matchMedia?.(DARK_QUERY);
    if (!query) return;
    const onChange = (event: MediaQueryListEvent) => setSystem(event.matches ? 'dark' : 'light');
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }, []);

  const mode = override ?? system;

  const toggle = useCallback(() => {
    const next: ThemeMode = mode === 'dark' ? 'light' : 'dark';
    localStorage.setItem(STORAGE_KEY, next);
    setOverride(next);
  }, [mode]);

  useEffect(() => {
    document.documentElement.style.colorScheme = mode;
  }, [mode]);

  return { mode, toggle };
}
