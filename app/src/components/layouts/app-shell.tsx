import type { NavAreaKey } from '@hopwise/common';
import { Text, makeStyles, mergeClasses, shorthands, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { NavItem } from '@/utils/nav-items';
import { HopwiseMark } from '../hopwise-mark';
import { ThemeToggle } from '../theme/theme-toggle';
import { NAV_ICONS } from './nav-icons';
import { UserMenu, type ShellUser } from './user-menu';

const NARROW = '@media (max-width: 720px)';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'grid',
    gridTemplateRows: 'auto 1fr',
    gridTemplateColumns: '220px minmax(0, 1fr)',
    gridTemplateAreas: '"header header" "nav main"',
    backgroundColor: tokens.colorNeutralBackground2,
    [NARROW]: {
      gridTemplateColumns: 'minmax(0, 1fr)',
      gridTemplateRows: 'auto auto 1fr',
      gridTemplateAreas: '"header" "nav" "main"',
    },
  },
  skipLink: {
    position: 'absolute',
    left: tokens.spacingHorizontalM,
    top: '-100px',
    zIndex: 100,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorBrandForeground1,
    borderRadius: tokens.borderRadiusMedium,
    boxShadow: tokens.shadow8,
    ':focus': { top: tokens.spacingVerticalS },
  },
  header: {
    gridArea: 'header',
    minWidth: 0,
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    backgroundColor: tokens.colorNeutralBackground1,
    borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
  },
  brand: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    color: tokens.colorNeutralForeground1,
    textDecorationLine: 'none',
    borderRadius: tokens.borderRadiusMedium,
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  brandName: { letterSpacing: '0.02em' },
  spacer: { flexGrow: 1 },
  nav: {
    gridArea: 'nav',
    minWidth: 0,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRight: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalS}`,
    [NARROW]: {
      borderRight: 'none',
      borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
      overflowX: 'auto',
      padding: tokens.spacingHorizontalXS,
    },
  },
  navList: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    [NARROW]: { flexDirection: 'row' },
  },
  navLink: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground2,
    textDecorationLine: 'none',
    fontSize: tokens.fontSizeBase300,
    whiteSpace: 'nowrap',
    position: 'relative',
    ':hover': {
      backgroundColor: tokens.colorNeutralBackground1Hover,
      color: tokens.colorNeutralForeground1,
    },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  navLinkActive: {
    backgroundColor: tokens.colorBrandBackground2,
    color: tokens.colorBrandForeground2,
    fontWeight: tokens.fontWeightSemibold,
    ':hover': {
      backgroundColor: tokens.colorBrandBackground2Hover,
      color: tokens.colorBrandForeground2,
    },
    '::before': {
      content: '""',
      position: 'absolute',
      left: 0,
      top: '8px',
      bottom: '8px',
      width: '3px',
      ...shorthands.borderRadius(tokens.borderRadiusCircular),
      backgroundColor: tokens.colorCompoundBrandStroke,
    },
  },
  navIcon: { display: 'inline-flex', fontSize: '20px' },
  navBadge: { marginLeft: 'auto', display: 'inline-flex' },
  main: {
    gridArea: 'main',
    padding: `${tokens.spacingVerticalXXL} ${tokens.spacingHorizontalXXL}`,
    minWidth: 0,
    ':focus': { outline: 'none' },
    [NARROW]: { padding: tokens.spacingHorizontalL },
  },
  content: { maxWidth: '1200px', margin: '0 auto' },
});

interface AppShellProps {
  user: ShellUser;
  navItems: NavItem[];
  onSignOut: () => void;
  /** Extra content beside a navigation item (e.g. the unread count of Notices). */
  navBadges?: Partial<Record<NavAreaKey, ReactNode>>;
  children: ReactNode;
}

/** Header (mark, name, theme toggle, user menu), the main navigation and the page. */
export function AppShell({ user, navItems, onSignOut, navBadges, children }: AppShellProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <a className={styles.skipLink} href="#main-content">
        Skip to content
      </a>
      <header className={styles.header}>
        <Link to={paths.dashboard.getHref()} className={styles.brand} aria-label="Hopwise home">
          <HopwiseMark size={30} />
          <Text as="span" size={500} weight="bold" className={styles.brandName}>
            Hopwise
          </Text>
        </Link>
        <span className={styles.spacer} />
        <ThemeToggle />
        <UserMenu user={user} onSignOut={onSignOut} />
      </header>
      <nav className={styles.nav} aria-label="Main">
        <ul className={styles.navList}>
          {navItems.map((item) => (
            <li key={item.key}>
              <NavLink
                to={item.href}
                className={({ isActive }) =>
                  mergeClasses(styles.navLink, isActive && styles.navLinkActive)
                }
              >
                <span className={styles.navIcon} aria-hidden>
                  {NAV_ICONS[item.key]}
                </span>
                {item.label}
                {navBadges?.[item.key] && (
                  <span className={styles.navBadge}>{navBadges[item.key]}</span>
                )}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <main id="main-content" className={styles.main} tabIndex={-1}>
        <div className={styles.content}>{children}</div>
      </main>
    </div>
  );
}
