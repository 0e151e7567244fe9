import type { Knex } from 'knex';
import type { AuditItem } from '../../../shared/schemas/audit';

export interface AuditEvent {
  sugarbushId: number | null;
  userId: number | null;
  action: string;
  entity: string;
  entityId?: number | null;
  detail?: unknown;
}

export interface AuditFilter {
  kind?: string;
  userId?: number;
  offset: number;
  limit: number;
}

/** SQLite's own defaults read `YYYY-MM-DD HH:MM:SS` (UTC, no zone); answers carry ISO. */
const iso = (value: unknown): string => {
  const s = String(value);
  return /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d$/.test(s) ? `${s.replace(' ', 'T')}Z` : s;
};

const parseDetail = (text: string | null): unknown => {
  if (text === null) return null;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
};

const auditRow = (e: AuditEvent) => ({
  sugarbush_id: e.sugarbushId,
  user_id: e.userId,
  action: e.action,
  entity: e.entity,
  entity_id: e.entityId ?? null,
  detail: e.detail === undefined ? null : JSON.stringify(e.detail),
});

export function auditRepository(db: Knex) {
  const ofStand = (sugarbushId: number, f: Pick<AuditFilter, 'kind' | 'userId'>) =>
    db('audit_events as e')
      .where('e.sugarbush_id', sugarbushId)
      .modify((q) => {
        if (f.kind) q.where('e.entity', f.kind);
        if (f.userId) q.where('e.user_id', f.userId);
      });

  return {
    record: (e: AuditEvent) => {
      return db('audit_events').insert(auditRow(e));
    },

    /** Many entries of one write (an import), a few hundred to an INSERT. */
    async recordMany(events: AuditEvent[]): Promise<void> {
      for (let i = 0; i < events.length; i += 150)
        await db('audit_events').insert(events.slice(i, i + 150).map(auditRow));
    },

    /**
     * A page of the stand's trail, newest first, with who made each entry and the tree it is
     * about (a tree, one of its measurements or tapholes, a note on it).
     */
    async list(
      sugarbushId: number,
      f: AuditFilter,
    ): Promise<{ items: AuditItem[]; total: number }> {
      const [{ n }] = await ofStand(sugarbushId, f).count({ n: '*' });
      const rows: Record<string, unknown>[] = await ofStand(sugarbushId, f)
        .leftJoin('users as u', 'u.id', 'e.user_id')
        .leftJoin('measurements as m', function () {
          this.on('m.id', 'e.entity_id').andOn('e.entity', db.raw('?', ['measurement']));
        })
        .leftJoin('tapholes as h', function () {
          this.on('h.id', 'e.entity_id').andOn('e.entity', db.raw('?', ['taphole']));
        })
        .leftJoin('notes as o', function () {
          this.on('o.id', 'e.entity_id').andOn('e.entity', db.raw('?', ['note']));
        })
        .leftJoin('trees as t', function () {
          this.on(
            't.id',
            db.raw(
              "case when e.entity = 'tree' then e.entity_id else coalesce(m.tree_id, h.tree_id, o.tree_id) end",
            ),
          );
        })
        .orderBy([
          { column: 'e.created_at', order: 'desc' },
          { column: 'e.id', order: 'desc' },
        ])
        .offset(f.offset)
        .limit(f.limit)
        .select(
          'e.id',
          'e.created_at',
          'e.user_id',
          'u.name as user_name',
          'e.action',
          'e.entity',
          'e.entity_id',
          'e.detail',
          't.id as tree_id',
          't.tag as tree_tag',
        );
      return {
        total: Number(n),
        items: rows.map((r) => ({
          id: Number(r.id),
          at: iso(r.created_at),
          userId: r.user_id === null ? null : Number(r.user_id),
          userName: (r.user_name as string | null) ?? null,
          action: String(r.action),
          kind: String(r.entity),
          entityId: r.entity_id === null ? null : Number(r.entity_id),
          tree: r.tree_id === null ? null : { id: Number(r.tree_id), tag: String(r.tree_tag) },
          detail: parseDetail(r.detail as string | null),
        })),
      };
    },

    /** Everyone with an entry in the stand's trail. */
    async people(sugarbushId: number): Promise<{ id: number; name: string }[]> {
      const rows = await db('users as u')
        .whereIn('u.id', db('audit_events').where({ sugarbush_id: sugarbushId }).select('user_id'))
        .orderBy(['u.name', 'u.id'])
        .select('u.id', 'u.name');
      return rows.map((r) => ({ id: Number(r.id), name: r.name }));
    },
  };
}
