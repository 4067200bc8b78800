import type { NavAreaKey } from '@hopwise/common';
import type { ComponentType } from 'react';
import { Navigate, createBrowserRouter, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { FullPageSpinner } from '@/components/full-page-spinner';
import { paths } from '@/config/paths';
import { RequireArea } from './require-area';

type RouteModule = { default: ComponentType };

/** A lazily loaded route module with its own error boundary (CONVENTIONS: Client). */
const lazyRoute =
  (load: () => Promise<RouteModule>): RouteObject['lazy'] =>
  async () => {
    const { default: Component } = await load();
    return { Component, ErrorBoundary: RouteError };
  };

/** The same, behind the role guard of one navigation area. */
const lazyArea =
  (area: NavAreaKey, load: () => Promise<RouteModule>): RouteObject['lazy'] =>
  async () => {
    const { default: Page } = await load();
    const Component = () => (
      <RequireArea area={area}>
        <Page />
      </RequireArea>
    );
    return { Component, ErrorBoundary: RouteError };
  };

const relative = (path: string) => path.replace(/^\//, '');

const loading = <FullPageSpinner label="Loading Hopwise…" />;

export const routes: RouteObject[] = [
  {
    path: paths.signIn.path,
    hydrateFallbackElement: loading,
    lazy: lazyRoute(() => import('./routes/sign-in')),
  },
  {
    path: paths.home.path,
    hydrateFallbackElement: loading,
    lazy: lazyRoute(() => import('./routes/app-root')),
    children: [
      { index: true, element: <Navigate to={paths.dashboard.getHref()} replace /> },
      {
        path: relative(paths.dashboard.path),
        lazy: lazyArea('dashboard', () => import('./routes/dashboard')),
      },
      { path: relative(paths.map.path), lazy: lazyArea('map', () => import('./routes/map')) },
      { path: relative(paths.links.path), lazy: lazyArea('links', () => import('./routes/links')) },
      {
        path: relative(paths.linkStudy.path),
        lazy: lazyArea('links', () => import('./routes/link-study')),
      },
      {
        path: relative(paths.profiles.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles')),
      },
      {
        path: relative(paths.profileBuild.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles/build')),
      },
      {
        path: relative(paths.profileUpload.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles/upload')),
      },
      {
        path: relative(paths.profileInvert.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles/invert')),
      },
      {
        path: relative(paths.profileCompare.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles/compare')),
      },
      {
        path: relative(paths.profileDetail.path),
        lazy: lazyArea('profiles', () => import('./routes/profiles/detail')),
      },
      { path: relative(paths.nets.path), lazy: lazyArea('nets', () => import('./routes/nets')) },
      {
        path: relative(paths.notices.path),
        lazy: lazyArea('notices', () => import('./routes/notices')),
      },
      {
        path: relative(paths.adminUsers.path),
        lazy: lazyArea('admin', () => import('./routes/admin/users')),
      },
      {
        path: relative(paths.adminAudit.path),
        lazy: lazyArea('admin', () => import('./routes/admin/audit')),
      },
      { path: '*', lazy: lazyRoute(() => import('./routes/not-found')) },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
