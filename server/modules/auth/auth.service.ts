import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { membersRepository } from '../members/members.repository';
import { toPublicUser, usersRepository } from '../users/users.repository';
import type { MeResponse, PublicUser, RegisterInput } from '../../../shared/schemas/auth';
import { hashPassword } from './password';
import { tokensRepository } from './tokens';

export function authService(ctx: AppContext) {
  const users = usersRepository(ctx.db);
  const members = membersRepository(ctx.db);
  const tokens = tokensRepository(ctx.db);

  return {
    async me(user: PublicUser): Promise<MeResponse> {
      return { user, memberships: await members.membershipsOf(user.id) };
    },

    async register(input: RegisterInput): Promise<PublicUser> {
      if (await users.findByEmail(input.email)) {
        throw new AppError(409, 'email-taken', 'An account with this e-mail already exists', {
          email: 'An account with this e-mail already exists',
        });
      }
      const id = await users.create({
        email: input.email,
        name: input.name,
        passwordHash: await hashPassword(input.password),
      });
      return toPublicUser((await users.findById(id))!);
    },

    /** Always answers the same way, so the form does not reveal which e-mails have accounts. */
    async requestPasswordReset(email: string): Promise<void> {
      const user = await users.findByEmail(email);
      if (!user) return;
      const token = await tokens.issue({ purpose: 'password-reset', userId: user.id, ttlHours: 2 });
      await ctx.mailer.send({
        to: user.email,
        subject: 'Reset your Clearwood password',
        text:
          `Someone asked to reset the password for ${user.email}.\n\n` +
          `Open this link within two hours to choose a new one:\n` +
          `${ctx.config.appUrl}/reset-password?token=${token}\n\n` +
          `If it was not you, ignore this mail: your password stays as it is.`,
      });
    },

    async confirmPasswordReset(token: string, password: string): Promise<void> {
      const row = await tokens.consume(token, 'password-reset');
      if (!row?.user_id)
        throw new AppError(400, 'token-invalid', 'This reset link is unknown, used or expired');
      await users.setPassword(row.user_id, await hashPassword(password));
      await ctx.db('sessions').whereLike('sess', `%"passport":{"user":${row.user_id}}%`).delete();
    },
  };
}
