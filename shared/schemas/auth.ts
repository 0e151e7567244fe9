import { z } from 'zod';
import { roleSchema } from './enums';

export const emailSchema = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, 'Use at most 254 characters')
  .email('Enter an e-mail address');

/** A new password: long enough, not only spaces. */
export const newPasswordSchema = z
  .string({ error: 'Choose a password' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters')
  .refine((v) => v.trim().length > 0, 'A password of spaces only is not allowed');

export const personNameSchema = z
  .string({ error: 'Enter your name' })
  .trim()
  .min(1, 'Enter your name')
  .max(120, 'Use at most 120 characters');

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

/**
 * `POST /api/auth/register`. Answers 202 `SignUpAnswer` alike for new and known addresses; the
 * mail then carries a link to `/sign-up?token=` (new address) or a reminder to sign in (known).
 */
export const registerSchema = z.object({
  email: emailSchema,
  name: personNameSchema,
  password: newPasswordSchema,
});
export type RegisterInput = z.infer<typeof registerSchema>;

/** `POST /api/auth/register/confirm`: the link's token; answers 201 `MeResponse`, signed in. */
export const registerConfirmSchema = z.object({ token: z.string().min(10).max(200) });
export type RegisterConfirmInput = z.infer<typeof registerConfirmSchema>;

/** `POST /api/auth/password-reset`: answers 202 `SignUpAnswer`-like `{ ok, message }` always. */
export const resetRequestSchema = z.object({ email: emailSchema });
export type ResetRequestInput = z.infer<typeof resetRequestSchema>;

/** `POST /api/auth/password-reset/confirm`: answers 200 `{ ok: true }`; the user signs in anew. */
export const resetConfirmSchema = z.object({
  token: z.string().min(10).max(200),
  password: newPasswordSchema,
});
export type ResetConfirmInput = z.infer<typeof resetConfirmSchema>;

/** The reset form: the new password twice (the client sends `resetConfirmSchema`). */
export const resetFormSchema = z
  .object({ password: newPasswordSchema, passwordAgain: z.string() })
  .refine((v) => v.password === v.passwordAgain, {
    path: ['passwordAgain'],
    message: 'The two passwords differ',
  });
export type ResetFormInput = z.infer<typeof resetFormSchema>;

/** What register and reset requests answer, the same for every address. */
export interface MailSentAnswer {
  ok: true;
  message: string;
}

export interface PublicUser {
  id: number;
  email: string;
  name: string;
  unitSystem: 'imperial' | 'metric';
}

export const membershipSchema = z.object({ sugarbushId: z.number().int(), role: roleSchema });
export type Membership = z.infer<typeof membershipSchema>;

export interface MeResponse {
  user: PublicUser;
  memberships: Membership[];
}
