import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { isUniqueViolation } from '../../lib/db-engine';
import { membersRepository } from '../members/members.repository';
import { toPublicUser, usersRepository } from '../users/users.repository';
import type {
  MailSentAnswer,
  MeResponse,
  PublicUser,
  RegisterInput,
} from '../../../shared/schemas/auth';
import { hashPassword } from './password';
import { tokensRepository } from './tokens';

const RESET_TTL_HOURS = 1;
const SIGN_UP_TTL_HOURS = 24;

/** The same words for every address, so the answer tells nobody which addresses have accounts. */
export const signUpAnswer: MailSentAnswer = {
  ok: true,
  message: 'Check your inbox: we sent a link to finish signing up.',
};
export const resetAnswer: MailSentAnswer = {
  ok: true,
  message: 'If an account uses this address, a link to choose a new password is on its way.',
};

export function authService(ctx: AppContext) {
  const users = usersRepository(ctx.db);
  const members = membersRepository(ctx.db);
  const tokens = tokensRepository(ctx.db);
  const link = (path: string, token: string) => `${ctx.config.appUrl}${path}?token=${token}`;

  return {
    async me(user: PublicUser): Promise<MeResponse> {
      return { user, memberships: await members.membershipsOf(user.id) };
    },

    /**
     * A sign-up waits for its e-mail to be confirmed: the password is hashed now either way (the
     * answer takes as long for a known address), and the mail goes out after the answer.
     */
    async register(input: RegisterInput): Promise<MailSentAnswer> {
      const passwordHash = await hashPassword(input.password);
      const known = await users.findByEmail(input.email);
      ctx.background.run('sign-up mail', async () => {
        if (known) {
          await ctx.mailer.send({
            to: input.email,
            subject: 'You already have a Clearwood account',
            text:
              `Someone asked to sign up for Clearwood with ${input.email}, which already has an ` +
              `account.\n\nSign in at ${ctx.config.appUrl}/sign-in, or choose a new password at ` +
              `${ctx.config.appUrl}/forgot-password.\n\n` +
              `If it was not you, ignore this mail: nothing has changed.`,
          });
          return;
        }
        const token = await tokens.issue({
          purpose: 'sign-up',
          email: input.email,
          payload: { name: input.name, passwordHash },
          ttlHours: SIGN_UP_TTL_HOURS,
        });
        const url = link('/sign-up', token);
        await ctx.mailer.send({
          to: input.email,
          subject: 'Finish signing up for Clearwood',
          text:
            `Welcome to Clearwood, ${input.name}.\n\n` +
            `Open this link within a day to confirm your e-mail and start:\n${url}\n\n` +
            `If you did not sign up, ignore this mail: no account is made.`,
          link: url,
        });
      });
      return signUpAnswer;
    },

    /** The mailed sign-up link makes the account; the caller signs the person in. */
    async confirmRegistration(token: string): Promise<PublicUser> {
      const row = await tokens.consume(token, 'sign-up');
      if (!row?.email || !row.payload)
        throw new AppError(400, 'token-invalid', 'This sign-up link is unknown, used or expired');
      if (await users.findByEmail(row.email))
        throw new AppError(409, 'email-taken', 'An account with this e-mail exists: sign in');
      const { name, passwordHash } = JSON.parse(row.payload) as {
        name: string;
        passwordHash: string;
      };
      const id = await users.create({ email: row.email, name, passwordHash }).catch((err) => {
        throw isUniqueViolation(err)
          ? new AppError(409, 'email-taken', 'An account with this e-mail exists: sign in')
          : err;
      });
      return toPublicUser((await users.findById(id))!);
    },

    /** Answers alike for every address; the link (if any) is made and mailed after the answer. */
    async requestPasswordReset(email: string): Promise<MailSentAnswer> {
      ctx.background.run('password-reset mail', async () => {
        const user = await users.findByEmail(email);
        if (!user) return;
        const token = await tokens.issue({
          purpose: 'password-reset',
          userId: user.id,
          ttlHours: RESET_TTL_HOURS,
        });
        const url = link('/reset-password', token);
        await ctx.mailer.send({
          to: user.email,
          subject: 'Choose a new Clearwood password',
          text:
            `Someone asked to reset the password for ${user.email}.\n\n` +
            `Open this link within an hour to choose a new one (it works once, and any earlier ` +
            `link stops working):\n${url}\n\n` +
            `If it was not you, ignore this mail: your password stays as it is.`,
          link: url,
        });
      });
      return resetAnswer;
    },

    /** A new password from a live link; every session of that user ends. */
    async confirmPasswordReset(token: string, password: string): Promise<void> {
      const row = await tokens.consume(token, 'password-reset');
      if (!row?.user_id)
        throw new AppError(400, 'token-invalid', 'This reset link is unknown, used or expired');
      await users.setPassword(row.user_id, await hashPassword(password));
      await ctx.db('sessions').whereLike('sess', `%"passport":{"user":${row.user_id}}%`).delete();
    },
  };
}
