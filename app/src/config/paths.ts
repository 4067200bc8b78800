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
  linkStudy: {
    path: '/links/:linkId/study',
    getHref: (linkId: number | string, studyId?: number) =>
      studyId ? `/links/${linkId}/study?study=${studyId}` : `/links/${linkId}/study`,
  },
  profiles: { path: '/profiles', getHref: () => '/profiles' },
  profileBuild: { path: '/profiles/build', getHref: () => '/profiles/build' },
  profileUpload: { path: '/profiles/upload', getHref: () => '/profiles/upload' },
  profileInvert: {
    path: '/profiles/invert',
    getHref: (soundingId?: number) =>
      soundingId ? `/profiles/invert?sounding=${soundingId}` : '/profiles/invert',
  },
  profileCompare: {
    path: '/profiles/compare',
    getHref: (ids?: readonly number[]) =>
      ids && ids.length > 0 ? `/profiles/compare?ids=${ids.join(',')}` : '/profiles/compare',
  },
  profileDetail: {
    path: '/profiles/:profileId',
    getHref: (id: number | string) => `/profiles/${id}`,
  },
  nets: { path: '/nets', getHref: () => '/nets' },
  notices: { path: '/notices', getHref: () => '/notices' },
  adminUsers: { path: '/admin/users', getHref: () => '/admin/users' },
  adminAudit: { path: '/admin/audit', getHref: () => '/admin/audit' },
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
