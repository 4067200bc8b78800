/** Every route of the client, with a builder for its link target. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (next?: string | null) =>
      next && next !== '/' ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in',
  },
  dashboard: { path: '/dashboard', getHref: () => '/dashboard' },
  map: { path: '/map', getHref: () => '/map' },
  links: { path: '/links', getHref: () => '/links' },
  profiles: { path: '/profiles', getHref: () => '/profiles' },
  nets: { path: '/nets', getHref: () => '/nets' },
  notices: { path: '/notices', getHref: () => '/notices' },
  adminUsers: { path: '/admin/users', getHref: () => '/admin/users' },
} as const;

/**
 * Where a `next` query parameter may send the user after sign-in: only paths inside this app
 * (no scheme, no protocol-relative `//host`), never back to sign-in itself.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) {
    return paths.dashboard.getHref();
  }
  if (next === paths.signIn.path || next.startsWith(`${paths.signIn.path}?`)) {
    return paths.dashboard.getHref();
  }
  return next;
}
