import type { Request, RequestHandler, Response } from 'express';
import type { Knex } from 'knex';
import { can, type Permission } from '../../shared/schemas/permissions';
import type { Role } from '../../shared/schemas/enums';
import { AppError, forbidden } from '../errors';
import { membersRepository } from '../modules/members/members.repository';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: number;
      email: string;
      name: string;
      unitSystem: 'imperial' | 'metric';
    }
  }
}

export interface Access {
  sugarbushId: number;
  role: Role;
  userId: number;
}

/**
 * What a route's own middleware says of who may call it, read by the access matrix
 * (tests/api/route-table.ts walks the router and reads these tags, so no list of routes is kept
 * by hand). `signed-in`: anyone signed in, about their own things; the others: a member of the
 * stand holding the row the path names, or 404.
 */
export type AccessScope =
  'signed-in' | 'sugarbush' | 'tree' | 'note' | 'photo' | 'sap-entry' | 'basemap';
export interface AccessRule {
  scope: AccessScope;
  /** The path parameter naming the row. */
  param?: string;
}
/** The role check of a route: one action, or one action per field of the body. */
export type PermissionRule = { action: Permission } | { byField: Record<string, Permission> };

/** Mark a middleware with the access rule it enforces. */
export const withAccess = <T extends RequestHandler>(fn: T, access: AccessRule) =>
  Object.assign(fn, { access });

export const requireAuth: RequestHandler = withAccess(
  (req, _res, next) => {
    if (!req.user) return next(new AppError(401, 'unauthenticated', 'Sign in first'));
    next();
  },
  { scope: 'signed-in' },
);

export const currentUser = (req: Request) => {
  if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in first');
  return req.user;
};

export const accessOf = (res: Response) => res.locals.access as Access;

const idParam = (raw: unknown, what: string) => {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) throw new AppError(404, 'not-found', `${what} not found`);
  return id;
};

/** Member of the sugarbush in `:id`, or 404: a non-member learns nothing of its existence. */
export function sugarbushAccess(db: Knex, param = 'id'): RequestHandler {
  const members = membersRepository(db);
  return withAccess(
    async (req, res, next) => {
      const user = currentUser(req);
      const sugarbushId = idParam(req.params[param], 'Sugarbush');
      const role = await members.roleOf(user.id, sugarbushId);
      if (!role) throw new AppError(404, 'not-found', 'Sugarbush not found');
      res.locals.access = { sugarbushId, role, userId: user.id } satisfies Access;
      next();
    },
    { scope: 'sugarbush', param },
  );
}

/** Member of the sugarbush holding the tree in `:treeId`, or 404 for the tree. */
export function treeAccess(db: Knex): RequestHandler {
  const members = membersRepository(db);
  return withAccess(
    async (req, res, next) => {
      const user = currentUser(req);
      const treeId = idParam(req.params.treeId, 'Tree');
      const tree = await db('trees').where({ id: treeId }).first('id', 'sugarbush_id');
      const role = tree ? await members.roleOf(user.id, tree.sugarbush_id) : null;
      if (!tree || !role) throw new AppError(404, 'not-found', 'Tree not found');
      res.locals.access = {
        sugarbushId: tree.sugarbush_id,
        role,
        userId: user.id,
      } satisfies Access;
      res.locals.treeId = treeId;
      next();
    },
    { scope: 'tree', param: 'treeId' },
  );
}

/**
 * Member of the sugarbush holding the row named by `:param` in `table` (a note, a photo, a sap entry), or 404
 * for it. The row's id, stand and tree land in `res.locals.row`.
 */
function rowAccess(
  db: Knex,
  table: 'notes' | 'photos' | 'sap_entries',
  param: string,
  what: string,
): RequestHandler {
  const members = membersRepository(db);
  const scope: AccessScope =
    table === 'notes' ? 'note' : table === 'photos' ? 'photo' : 'sap-entry';
  return withAccess(
    async (req, res, next) => {
      const user = currentUser(req);
      const id = idParam(req.params[param], what);
      const row = await db(table)
        .where({ id })
        .first(
          'id',
          'sugarbush_id',
          table === 'sap_entries' ? db.raw('null as tree_id') : 'tree_id',
        );
      const role = row ? await members.roleOf(user.id, row.sugarbush_id) : null;
      if (!row || !role) throw new AppError(404, 'not-found', `${what} not found`);
      res.locals.access = { sugarbushId: row.sugarbush_id, role, userId: user.id } satisfies Access;
      res.locals.row = {
        id,
        sugarbushId: Number(row.sugarbush_id),
        treeId: row.tree_id === null ? null : Number(row.tree_id),
      } satisfies AccessedRow;
      next();
    },
    { scope, param },
  );
}

export interface AccessedRow {
  id: number;
  sugarbushId: number;
  treeId: number | null;
}

export const rowOf = (res: Response) => res.locals.row as AccessedRow;

/** Member of the stand holding the note in `:noteId`, or 404 for the note. */
export const noteAccess = (db: Knex) => rowAccess(db, 'notes', 'noteId', 'Note');

/** Member of the stand holding the photo in `:photoId`, or 404 for the photo. */
export const photoAccess = (db: Knex) => rowAccess(db, 'photos', 'photoId', 'Photo');

/** Member of the stand holding the sap entry in `:entryId`, or 404 for the entry. */
export const sapEntryAccess = (db: Knex) => rowAccess(db, 'sap_entries', 'entryId', 'Sap entry');

/** The member's role must allow the action (the table in shared/schemas/permissions.ts), else 403. */
export function requirePermission(action: Permission): RequestHandler {
  const check: RequestHandler = (_req, res, next) => {
    if (!can(accessOf(res)?.role, action)) return next(forbidden());
    next();
  };
  return Object.assign(check, { permission: { action } satisfies PermissionRule });
}

/**
 * A change whose fields need different actions: every field present in the body needs its own
 * (a forester may redraw the boundary but not rename the stand). A body naming none of them
 * still needs one of the actions, so a member who may change nothing gets 403, not a no-op.
 */
export function requireFieldPermissions(byField: Record<string, Permission>): RequestHandler {
  const all = [...new Set(Object.values(byField))];
  const check: RequestHandler = (req, res, next) => {
    const role = accessOf(res)?.role;
    const body = (req.body ?? {}) as Record<string, unknown>;
    const present = Object.keys(byField).filter((field) => body[field] !== undefined);
    const allowed =
      present.length > 0
        ? present.every((field) => can(role, byField[field]))
        : all.some((action) => can(role, action));
    if (!allowed) return next(forbidden());
    next();
  };
  return Object.assign(check, { permission: { byField } satisfies PermissionRule });
}
