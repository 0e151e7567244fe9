import type { AppContext } from '../../context';
import type { Access } from '../../middleware/auth';
import { pageOf } from '../../lib/paging';
import { auditRepository } from '../audit/audit.repository';
import { isoDay } from '../../../shared/schemas/iso-date';
import {
  FOLLOW_UP_DUE_DAYS,
  type Note,
  type NoteChange,
  type NoteInput,
  type NoteListQuery,
} from '../../../shared/schemas/note';
import { notesRepository, type FollowUpDays } from './notes.repository';

/** Today and the last date a follow-up counts as due, in UTC. */
export function followUpDays(now: Date = new Date()): FollowUpDays {
  return { today: isoDay(now), dueBy: isoDay(now, FOLLOW_UP_DUE_DAYS) };
}

export function notesService(ctx: AppContext) {
  const repo = notesRepository(ctx.db);

  return {
    list(where: { treeId?: number; sugarbushId?: number }, q: NoteListQuery) {
      const { page: _page, pageSize: _pageSize, ...filters } = q;
      return pageOf(q, (range) => repo.list(where, filters, followUpDays(), range));
    },

    /** The note and its audit entry are written together or not at all. */
    async create(access: Access, treeId: number | null, input: NoteInput): Promise<Note> {
      return ctx.db.transaction(async (trx) => {
        const note = await notesRepository(trx).create({
          sugarbushId: access.sugarbushId,
          treeId,
          authorId: access.userId,
          ...input,
        });
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'create',
          entity: 'note',
          entityId: note.id,
        });
        return note;
      });
    },

    /**
     * Resolve or reopen a note, or move its follow-up. Resolving a resolved note keeps who
     * resolved it first and when; reopening clears both.
     */
    async change(access: Access, noteId: number, change: NoteChange): Promise<Note> {
      const current = await repo.find(noteId);
      const columns: Record<string, unknown> = {};
      const wasResolved = current.resolved_at !== null;
      if (change.resolved === true && !wasResolved)
        Object.assign(columns, { resolved_at: ctx.db.fn.now(), resolved_by: access.userId });
      if (change.resolved === false && wasResolved)
        Object.assign(columns, { resolved_at: null, resolved_by: null });
      if (change.followUpOn !== undefined) columns.follow_up_on = change.followUpOn;
      if (Object.keys(columns).length > 0) {
        const action =
          'resolved_at' in columns ? (change.resolved ? 'resolve' : 'reopen') : 'update';
        await ctx.db.transaction(async (trx) => {
          await notesRepository(trx).update(noteId, columns);
          await auditRepository(trx).record({
            sugarbushId: access.sugarbushId,
            userId: access.userId,
            action,
            entity: 'note',
            entityId: noteId,
            // What the change replaces stays in the entry: who resolved it and when, the old date.
            detail: {
              ...change,
              earlier: {
                resolvedAt: current.resolved_at ?? null,
                resolvedBy: current.resolved_by ?? null,
                followUpOn: current.follow_up_on ?? null,
              },
            },
          });
        });
      }
      return repo.one(noteId);
    },
  };
}
