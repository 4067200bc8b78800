import { PERMISSIONS, type Permission } from '@hopwise/common';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { ModulesContainer } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { IS_PUBLIC } from '../src/http/public.decorator.js';
import { REQUIRED_PERMISSIONS } from '../src/http/require-permission.decorator.js';

/**
 * Every HTTP route of the running application, read from Nest's own controller metadata (the
 * same metadata the router and the guards use), so routes added later are covered automatically.
 */
export interface RouteInfo {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Full path with the global prefix, e.g. `/api/stations/:id`. */
  path: string;
  /** `METHOD /path`, e.g. `GET /api/stations/:id`. */
  key: string;
  /** Class-level and handler-level `@RequirePermission` merged, as PermissionsGuard does. */
  permissions: Permission[];
  isPublic: boolean;
  controller: string;
  handler: string;
}

const METHODS: Partial<Record<RequestMethod, RouteInfo['method']>> = {
  [RequestMethod.GET]: 'GET',
  [RequestMethod.POST]: 'POST',
  [RequestMethod.PUT]: 'PUT',
  [RequestMethod.PATCH]: 'PATCH',
  [RequestMethod.DELETE]: 'DELETE',
};

const GLOBAL_PREFIX = '/api';

function joinPath(...parts: string[]): string {
  const joined = parts
    .flatMap((p) => p.split('/'))
    .filter(Boolean)
    .join('/');
  return `/${joined}`;
}

function asList<T>(value: T | T[] | undefined): T[] {
  if (value === undefined) return [];
  return Array.isArray(value) ? value : [value];
}

type Ctor = abstract new (...args: never[]) => unknown;

export function listRoutes(app: NestExpressApplication): RouteInfo[] {
  const routes: RouteInfo[] = [];
  const seen = new Set<Ctor>();
  for (const mod of app.get(ModulesContainer).values()) {
    for (const wrapper of mod.controllers.values()) {
      const ctor = wrapper.metatype as Ctor | null;
      if (!ctor || seen.has(ctor)) continue;
      seen.add(ctor);
      const classPaths = asList<string>(Reflect.getMetadata(PATH_METADATA, ctor) as string);
      const proto = ctor.prototype as Record<string, unknown>;
      for (const name of Object.getOwnPropertyNames(proto)) {
        const handler = proto[name];
        if (name === 'constructor' || typeof handler !== 'function') continue;
        const methodPaths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[];
        const requestMethod = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod;
        if (methodPaths === undefined || requestMethod === undefined) continue;
        const method = METHODS[requestMethod];
        if (!method) throw new Error(`${ctor.name}.${name}: unsupported method ${requestMethod}`);
        const permissions = [
          ...asList<Permission>(Reflect.getMetadata(REQUIRED_PERMISSIONS, ctor) as Permission[]),
          ...asList<Permission>(Reflect.getMetadata(REQUIRED_PERMISSIONS, handler) as Permission[]),
        ];
        for (const p of permissions) {
          if (!(PERMISSIONS as readonly string[]).includes(p)) {
            throw new Error(`${ctor.name}.${name}: unknown permission "${p}"`);
          }
        }
        const isPublic =
          Reflect.getMetadata(IS_PUBLIC, handler) === true ||
          Reflect.getMetadata(IS_PUBLIC, ctor) === true;
        for (const classPath of classPaths) {
          for (const methodPath of asList(methodPaths)) {
            const path = joinPath(GLOBAL_PREFIX, classPath, methodPath);
            routes.push({
              method,
              path,
              key: `${method} ${path}`,
              permissions: [...new Set(permissions)],
              isPublic,
              controller: ctor.name,
              handler: name,
            });
          }
        }
      }
    }
  }
  return routes.sort((a, b) => a.key.localeCompare(b.key));
}

interface ExpressLayer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** `METHOD /path` of every route Express actually serves (to cross-check listRoutes). */
export function expressRouteKeys(app: NestExpressApplication): string[] {
  const instance = app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  const keys = new Set<string>();
  for (const layer of instance.router.stack) {
    if (!layer.route) continue;
    for (const path of asList(layer.route.path)) {
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (on && method !== '_all') keys.add(`${method.toUpperCase()} ${path}`);
      }
    }
  }
  return [...keys].sort();
}

/** A concrete URL for a route: every `:param` replaced (ids by `id`, others by `x`). */
export function fillPath(path: string, id: number | string = 999_999): string {
  return path.replace(/:(\w+)/g, (_m, name: string) =>
    /id$/i.test(name) ? encodeURIComponent(String(id)) : 'x',
  );
}

/** The resource of a route: the first segment after `/api` (`/api/links/:id/x` → `links`). */
export const resourceOf = (path: string) => path.split('/')[2] ?? '';
