import type { AppContext } from '../../context';
import { AppError, notFound } from '../../errors';
import type { Access } from '../../middleware/auth';
import { lockRow } from '../../lib/db-engine';
import { pageOf } from '../../lib/paging';
import { auditRepository } from '../audit/audit.repository';
import type { Page } from '../../../shared/schemas/list-query';
import type { Member, MemberPatch } from '../../../shared/schemas/members';
import { can, permissions } from '../../../shared/schemas/permissions';
import { membersRepository, type MemberSort } from './members.repository';

export interface MemberListQuery {
  page: number;
  pageSize: number;
  q?: string;
  sort?: `${'' | '-'}${MemberSort}`;
}

/** The roles that can manage the team: a stand always keeps at least one member holding one. */
const managers = permissions['manage-members'];

const lastOwner = () =>
  new AppError(
    409,
    'last-owner',
    'A sugarbush needs at least one owner: make someone else owner first',
  );

export function membersService(ctx: AppContext) {
  const repo = membersRepository(ctx.db);

  return {
    list(sugarbushId: number, q: MemberListQuery): Promise<Page<Member>> {
      const sort = q.sort?.replace(/^-/, '') as MemberSort | undefined;
      return pageOf(q, (range) =>
        repo.list(sugarbushId, { ...range, q: q.q, sort, descending: q.sort?.startsWith('-') }),
      );
    },

    /**
     * One transaction holding the stand's row lock, so two owners demoting each other at once
     * cannot leave none: the second one counts after the first has committed.
     */
    async changeRole(access: Access, userId: number, patch: MemberPatch): Promise<Member> {
      await ctx.db.transaction(async (trx) => {
        await lockRow(trx, 'sugarbushes', access.sugarbushId);
        const members = membersRepository(trx);
        const member = await members.find(access.sugarbushId, userId);
        if (!member) throw notFound('Member');
        if (can(member.role, 'manage-members') && !can(patch.role, 'manage-members')) {
          if ((await members.countWithRole(access.sugarbushId, managers)) <= 1) throw lastOwner();
        }
        await members.setRole(access.sugarbushId, userId, patch.role);
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'change-role',
          entity: 'member',
          entityId: userId,
          detail: { from: member.role, to: patch.role },
        });
      });
      return (await repo.find(access.sugarbushId, userId))!;
    },

    async remove(access: Access, userId: number): Promise<void> {
      await ctx.db.transaction(async (trx) => {
        await lockRow(trx, 'sugarbushes', access.sugarbushId);
        const members = membersRepository(trx);
        const member = await members.find(access.sugarbushId, userId);
        if (!member) throw notFound('Member');
        if (
          can(member.role, 'manage-members') &&
          (await members.countWithRole(access.sugarbushId, managers)) <= 1
        )
          throw lastOwner();
        await members.remove(access.sugarbushId, userId);
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'remove',
          entity: 'member',
          entityId: userId,
          detail: { role: member.role, email: member.email },
        });
      });
    },
  };
}
