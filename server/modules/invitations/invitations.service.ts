import type { Knex } from 'knex';
import type { AppContext } from '../../context';
import { AppError, notFound } from '../../errors';
import type { Access } from '../../middleware/auth';
import { isUniqueViolation } from '../../lib/db-engine';
import { pageOf } from '../../lib/paging';
import { hashToken, newSecretToken } from '../../lib/secret-token';
import { auditRepository } from '../audit/audit.repository';
import { hashPassword } from '../auth/password';
import { membersRepository } from '../members/members.repository';
import { toPublicUser, usersRepository } from '../users/users.repository';
import type { PublicUser } from '../../../shared/schemas/auth';
import { roleLabels } from '../../../shared/schemas/enums';
import {
  INVITATION_DAYS,
  type AcceptInvitationInput,
  type Invitation,
  type InvitationInput,
  type InvitationPreview,
} from '../../../shared/schemas/invitation';
import type { ListQuery, Page } from '../../../shared/schemas/list-query';
import { assertInvitationUsable } from './invitation-state';
import { invitationsRepository, type InvitationRow } from './invitations.repository';

const expiry = () => new Date(Date.now() + INVITATION_DAYS * 24 * 3600_000).toISOString();

export function invitationsService(ctx: AppContext) {
  const repo = invitationsRepository(ctx.db);
  const users = usersRepository(ctx.db);
  const members = membersRepository(ctx.db);

  /** The link goes out after the answer; only its recipient ever sees it. */
  function mailLink(
    row: { email: string; role: InvitationRow['role'] },
    token: string,
    by: string,
    stand: string,
  ) {
    const url = `${ctx.config.appUrl}/invitations/${token}`;
    ctx.background.run('invitation mail', () =>
      ctx.mailer.send({
        to: row.email,
        subject: `${by} invites you to ${stand} on Clearwood`,
        text:
          `${by} invites you to join the sugarbush ${stand} on Clearwood as ` +
          `${roleLabels[row.role].toLowerCase()}.\n\n` +
          `Open this link within ${INVITATION_DAYS} days to accept (it works once):\n${url}\n\n` +
          `If you do not know ${by}, ignore this mail.`,
        link: url,
      }),
    );
  }

  async function names(access: Access) {
    const [stand, inviter] = await Promise.all([
      ctx.db('sugarbushes').where({ id: access.sugarbushId }).first('name'),
      users.findById(access.userId),
    ]);
    return { stand: stand?.name as string, by: inviter?.name ?? 'The owner' };
  }

  async function openOne(sugarbushId: number, id: number): Promise<Invitation> {
    const invitation = await repo.findOpen(sugarbushId, id);
    if (!invitation) throw notFound('Invitation');
    return invitation;
  }

  return {
    list: (sugarbushId: number, q: ListQuery): Promise<Page<Invitation>> =>
      pageOf(q, (range) => repo.listOpen(sugarbushId, { ...range, q: q.q })),

    /** A new invitation replaces any open one for the same address. */
    async invite(access: Access, input: InvitationInput): Promise<Invitation> {
      const existing = await users.findByEmail(input.email);
      if (existing && (await members.roleOf(existing.id, access.sugarbushId)))
        throw new AppError(409, 'already-member', `${input.email} is on the team already`, {
          email: `${input.email} is on the team already`,
        });
      const { token, hash } = newSecretToken();
      const id = await ctx.db.transaction(async (trx) => {
        await invitationsRepository(trx).revokeOpenFor(access.sugarbushId, input.email);
        const newId = await invitationsRepository(trx).create({
          sugarbushId: access.sugarbushId,
          email: input.email,
          role: input.role,
          tokenHash: hash,
          invitedBy: access.userId,
          expiresAt: expiry(),
        });
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'invite',
          entity: 'invitation',
          entityId: newId,
          detail: { email: input.email, role: input.role },
        });
        return newId;
      });
      const { stand, by } = await names(access);
      mailLink(input, token, by, stand);
      return openOne(access.sugarbushId, id);
    },

    /** A fresh link and a fresh seven days; the old link stops working. */
    async resend(access: Access, id: number): Promise<Invitation> {
      const invitation = await openOne(access.sugarbushId, id);
      const { token, hash } = newSecretToken();
      await ctx.db.transaction(async (trx) => {
        await invitationsRepository(trx).renew(id, hash, expiry());
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'resend',
          entity: 'invitation',
          entityId: id,
        });
      });
      const { stand, by } = await names(access);
      mailLink(invitation, token, by, stand);
      return openOne(access.sugarbushId, id);
    },

    async revoke(access: Access, id: number): Promise<void> {
      await openOne(access.sugarbushId, id);
      await ctx.db.transaction(async (trx) => {
        await invitationsRepository(trx).revoke(id);
        await auditRepository(trx).record({
          sugarbushId: access.sugarbushId,
          userId: access.userId,
          action: 'revoke',
          entity: 'invitation',
          entityId: id,
        });
      });
    },

    async preview(token: string, user: PublicUser | undefined): Promise<InvitationPreview> {
      const row = assertInvitationUsable(await repo.findByTokenHash(hashToken(token)));
      const [stand, inviter, account] = await Promise.all([
        ctx.db('sugarbushes').where({ id: row.sugarbush_id }).first('name'),
        row.invited_by ? users.findById(row.invited_by) : undefined,
        users.findByEmail(row.email),
      ]);
      return {
        sugarbushName: stand?.name ?? '',
        role: row.role,
        email: row.email,
        invitedByName: inviter?.name ?? null,
        expiresAt: row.expires_at,
        accountExists: Boolean(account),
        signedInEmail: user?.email ?? null,
      };
    },

    /**
     * Join with the signed-in account (it must be the invited address), or make the account from
     * the name and password given. One transaction: on any refusal nothing has changed.
     */
    async accept(
      token: string,
      user: PublicUser | undefined,
      input: AcceptInvitationInput,
    ): Promise<{ user: PublicUser; sugarbushId: number; role: InvitationRow['role'] }> {
      const passwordHash = !user && input.password ? await hashPassword(input.password) : undefined;
      const result = await ctx.db.transaction(async (trx) => {
        const row = assertInvitationUsable(
          await invitationsRepository(trx).lockByTokenHash(hashToken(token)),
        );
        const joining = user ?? (await createInvitee(trx, row, input, passwordHash));
        if (joining.email !== row.email)
          throw new AppError(
            403,
            'invitation-other-account',
            `This invitation is for ${row.email}; you are signed in as ${joining.email}`,
          );
        const alreadyMember = () =>
          new AppError(409, 'already-member', 'You are on this team already');
        if (await membersRepository(trx).roleOf(joining.id, row.sugarbush_id))
          throw alreadyMember();
        if (!(await invitationsRepository(trx).markAccepted(row.id, joining.id)))
          throw new AppError(409, 'invitation-used', 'This invitation has been used already');
        await membersRepository(trx)
          .add(joining.id, row.sugarbush_id, row.role)
          .catch((err: unknown) => {
            throw isUniqueViolation(err) ? alreadyMember() : err;
          });
        await auditRepository(trx).record({
          sugarbushId: row.sugarbush_id,
          userId: joining.id,
          action: 'accept',
          entity: 'invitation',
          entityId: row.id,
          detail: { role: row.role },
        });
        return { user: joining, sugarbushId: row.sugarbush_id, role: row.role };
      });
      return result;
    },
  };
}

/** The account an invitation creates: the invited address, the name and password given. */
async function createInvitee(
  trx: Knex.Transaction,
  row: InvitationRow,
  input: AcceptInvitationInput,
  passwordHash: string | undefined,
): Promise<PublicUser> {
  const users = usersRepository(trx);
  const accountExists = () =>
    new AppError(409, 'account-exists', `${row.email} has an account: sign in to join`);
  if (await users.findByEmail(row.email)) throw accountExists();
  if (!input.name || !passwordHash) {
    const fields: Record<string, string> = {};
    if (!input.name) fields.name = 'Enter your name';
    if (!passwordHash) fields.password = 'Choose a password';
    throw new AppError(400, 'invalid-input', 'Some fields need attention', fields);
  }
  // Another link (a sign-up, another stand's invitation) may make the account meanwhile.
  const id = await users
    .create({ email: row.email, name: input.name, passwordHash })
    .catch((err: unknown) => {
      throw isUniqueViolation(err) ? accountExists() : err;
    });
  return toPublicUser((await users.findById(id))!);
}
