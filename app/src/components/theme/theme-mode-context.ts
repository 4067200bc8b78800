import { createContext, useContext } from 'react';
import type { ThemeMode } from './hopwise-theme';

export interface ThemeModeValue {
  mode: ThemeMode;
  toggle: () => void;
}

export const ThemeModeContext = createContext<ThemeModeValue>({ mode: 'light', toggle: () => {} });

export const useThemeModeContext = (): ThemeModeValue => useContext(ThemeModeContext);
