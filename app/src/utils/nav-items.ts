import { NAV_AREAS, navAreasFor, type NavAreaKey, type Role } from '@hopwise/common';
import { paths } from '@/config/paths';

export interface NavItem {
  key: NavAreaKey;
  label: string;
  href: string;
}

/** Where each navigation area of the permission table lives in the client. */
export const NAV_AREA_HREFS: Readonly<Record<NavAreaKey, string>> = {
  dashboard: paths.dashboard.getHref(),
  map: paths.map.getHref(),
  links: paths.links.getHref(),
  profiles: paths.profiles.getHref(),
  nets: paths.nets.getHref(),
  notices: paths.notices.getHref(),
  admin: paths.adminUsers.getHref(),
};

/** The navigation a role sees, in the order of NAV_AREAS (the one permission table in common/). */
export function navItemsFor(role: Role): NavItem[] {
  const allowed = new Set(navAreasFor(role));
  return NAV_AREAS.filter((area) => allowed.has(area.key)).map((area) => ({
    key: area.key,
    label: area.label,
    href: NAV_AREA_HREFS[area.key],
  }));
}

export function canUseArea(role: Role, area: NavAreaKey): boolean {
  return navAreasFor(role).includes(area);
}
