import type { Knex } from 'knex';

export interface AuditEvent {
  sugarbushId: number | null;
  userId: number | null;
  action: string;
  entity: string;
  entityId?: number | null;
  detail?: unknown;
}

export function auditRepository(db: Knex) {
  return {
    record: (e: AuditEvent) => {
      return db('audit_events').insert({
        sugarbush_id: e.sugarbushId,
        user_id: e.userId,
        action: e.action,
        entity: e.entity,
        entity_id: e.entityId ?? null,
        detail: e.detail === undefined ? null : JSON.stringify(e.detail),
      });
    },
  };
}
