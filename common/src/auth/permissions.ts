/**
 * The one permission table (SPEC §1). A role gets exactly the permissions listed here;
 * a "higher" role never silently includes a lower one.
 */
export const ROLES = ['operator', 'netcontrol', 'analyst', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = [
  'compute:run', // physics compute routes
  'stations:use', // own stations, links, studies
  'profiles:read', // read the profile library
  'profiles:write', // upload, build, invert, edit own profiles and soundings
  'profiles:publish', // publish to the shared library
  'nets:manage', // create nets, schedule, publish schedules
  'nets:read', // see published schedules of nets one belongs to
  'notices:read', // in-app inbox and subscriptions
  'users:manage', // admin user management
  'audit:read', // read the audit log
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const OPERATOR: readonly Permission[] = [
  'compute:run',
  'stations:use',
  'profiles:read',
  'nets:read',
  'notices:read',
];

export const ROLE_PERMISSIONS: Readonly<Record<Role, readonly Permission[]>> = {
  operator: OPERATOR,
  netcontrol: [...OPERATOR, 'nets:manage'],
  analyst: [...OPERATOR, 'profiles:write', 'profiles:publish'],
  admin: [...PERMISSIONS],
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export function hasPermission(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].includes(permission);
}

/** Navigation areas of the client and the permission each needs. */
export const NAV_AREAS = [
  { key: 'dashboard', label: 'Dashboard', permission: 'compute:run' },
  { key: 'map', label: 'Map', permission: 'stations:use' },
  { key: 'links', label: 'Links', permission: 'stations:use' },
  { key: 'profiles', label: 'Profiles', permission: 'profiles:read' },
  { key: 'nets', label: 'Nets', permission: 'nets:read' },
  { key: 'notices', label: 'Notices', permission: 'notices:read' },
  { key: 'admin', label: 'Admin', permission: 'users:manage' },
] as const satisfies readonly { key: string; label: string; permission: Permission }[];
export type NavAreaKey = (typeof NAV_AREAS)[number]['key'];

export function navAreasFor(role: Role): NavAreaKey[] {
  return NAV_AREAS.filter((a) => hasPermission(role, a.permission)).map((a) => a.key);
}
