import { Button, Tooltip } from '@fluentui/react-components';
import { WeatherMoon24Regular, WeatherSunny24Regular } from '@fluentui/react-icons';
import { useThemeModeContext } from './theme-mode-context';

export function ThemeToggle() {
  const { mode, toggle } = useThemeModeContext();
  const label = mode === 'dark' ? 'Switch to light theme' : 'Switch to dark theme';
  return (
    <Tooltip content={label} relationship="label">
      <Button
        appearance="subtle"
        icon={mode === 'dark' ? <WeatherSunny24Regular /> : <WeatherMoon24Regular />}
        onClick={toggle}
      />
    </Tooltip>
  );
}
