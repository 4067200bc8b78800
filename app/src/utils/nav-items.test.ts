import { NAV_AREAS, ROLES } from '@hopwise/common';
import { describe, expect, it } from 'vitest';
import { canUseArea, navItemsFor } from './nav-items';

// Expected areas per role follow SPEC §1 (the role table): admin manages users; every role plans
// links, reads profiles, nets and notices.
describe('navItemsFor', () => {
  it('gives operators every area except Admin', () => {
    expect(navItemsFor('operator').map((item) => item.label)).toEqual([
      'Dashboard',
      'Map',
      'Links',
      'Profiles',
      'Nets',
      'Notices',
    ]);
  });

  it('gives admins all areas in table order, Admin linking to the users page', () => {
    const items = navItemsFor('admin');
    expect(items.map((item) => item.key)).toEqual(NAV_AREAS.map((area) => area.key));
    expect(items.find((item) => item.key === 'admin')?.href).toBe('/admin/users');
  });

  it('keeps Admin away from every role but admin', () => {
    for (const role of ROLES) {
      expect(canUseArea(role, 'admin')).toBe(role === 'admin');
    }
  });

  it('gives every item a distinct href', () => {
    const hrefs = navItemsFor('admin').map((item) => item.href);
    expect(new Set(hrefs).size).toBe(hrefs.length);
  });
});
