import type { Express, RequestHandler } from 'express';
import type { AccessRule, PermissionRule } from '../../server/middleware/auth';
import type { ReadsTag } from '../../server/middleware/validate';

/**
 * Every route of the app, read from Express itself, with the rules its own middleware carries.
 *
 * How Express 5 (router 2.x) keeps them: `app.router.stack` is a list of layers; a layer made by
 * `use()` has `rawPath` (its mount path, `/` when none) and, when it mounts a router, that
 * router as `layer.handle` with a `stack` of its own; a layer made by `get()`/`post()`/… has
 * `layer.route` with `path`, `methods` (`{ get: true }`) and `stack`, the route's own chain
 * (`layer.handle` of each). `layer.matchers` are compiled functions and say nothing readable;
 * `router.listRoutes()` (router 2.3) lists paths and methods but not the handlers, so the stack
 * is walked directly.
 *
 * Each middleware that decides access is tagged where it is made (server/middleware/auth.ts):
 * `access` ({ scope, param }) on `requireAuth`, `sugarbushAccess`, `treeAccess`, `noteAccess`,
 * `photoAccess` and the basemap check; `permission` on `requirePermission` and
 * `requireFieldPermissions`; `reads` on `validate` and the upload receivers
 * (server/middleware/validate.ts). Only the route's own chain counts: a router-wide
 * `use(requireAuth)` does not make a route's rule, so a route that names none is seen as such.
 */
export interface RouteInfo {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  /** The full path, as Express matches it: `/api/trees/:treeId/notes`. */
  path: string;
  /** `GET /api/trees/:treeId/notes` */
  key: string;
  access?: AccessRule;
  permission?: PermissionRule;
  body?: 'json' | 'multipart';
  query: boolean;
  params: string[];
}

type Tagged = RequestHandler & {
  access?: AccessRule;
  permission?: PermissionRule;
  reads?: ReadsTag;
  stack?: Layer[];
};
interface Layer {
  rawPath?: string | string[];
  handle: Tagged;
  route?: { path: string | string[]; methods: Record<string, boolean>; stack: Layer[] };
}

const join = (prefix: string, path: string) =>
  `${prefix}${path === '/' ? '' : path}`.replace(/\/{2,}/g, '/') || '/';

function walk(stack: Layer[], prefix: string, out: RouteInfo[]) {
  for (const layer of stack) {
    if (layer.route) {
      const paths = [layer.route.path].flat();
      const chain = layer.route.stack.map((l) => l.handle);
      const access = chain.find((h) => h.access)?.access;
      const permission = chain.find((h) => h.permission)?.permission;
      const reads = chain.map((h) => h.reads ?? {});
      const methods = Object.keys(layer.route.methods).filter((m) => m !== '_all');
      for (const path of paths)
        for (const method of methods) {
          const full = join(prefix, path);
          out.push({
            method: method as RouteInfo['method'],
            path: full,
            key: `${method.toUpperCase()} ${full}`,
            access,
            permission,
            body: reads.find((r) => r.body)?.body,
            query: reads.some((r) => r.query),
            params: [...full.matchAll(/:(\w+)/g)].map((m) => m[1]),
          });
        }
    } else if (Array.isArray(layer.handle.stack)) {
      for (const path of [layer.rawPath ?? '/'].flat())
        walk(layer.handle.stack, join(prefix, path), out);
    }
  }
}

/** Every `/api` route of the app. */
export function apiRouteTable(app: Express): RouteInfo[] {
  const out: RouteInfo[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  return out.filter((r) => r.path.startsWith('/api/'));
}
