import { z } from 'zod';
import { emailSchema, newPasswordSchema, personNameSchema, type MeResponse } from './auth';
import { roleSchema, type Role } from './enums';

/** Invitation links are single-use and live this long. */
export const INVITATION_DAYS = 7;

/** `POST /api/sugarbushes/:id/invitations` → 201 `Invitation`; a current member is 409. */
export const invitationInputSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationInput = z.infer<typeof invitationInputSchema>;

/**
 * A pending invitation as the owner sees it (`GET /api/sugarbushes/:id/invitations`, a page).
 * Accepted and revoked ones are not listed; expired ones are, so they can be resent.
 * `POST .../invitations/:invitationId/resend` mails a fresh link (the old one dies) → `Invitation`;
 * `DELETE .../invitations/:invitationId` revokes → 204.
 */
export interface Invitation {
  id: number;
  email: string;
  role: Role;
  status: 'pending' | 'expired';
  invitedBy: { userId: number; name: string } | null;
  createdAt: string;
  expiresAt: string;
}

/**
 * `GET /api/invitations/:token` (no sign-in needed): what the link offers. Unknown → 404
 * `invitation-unknown`; used → 409 `invitation-used`; revoked → 410 `invitation-revoked`;
 * expired → 410 `invitation-expired`.
 */
export interface InvitationPreview {
  sugarbushName: string;
  role: Role;
  email: string;
  invitedByName: string | null;
  expiresAt: string;
  /** Whether an account with the invited e-mail exists (then: sign in, then accept). */
  accountExists: boolean;
  /** The signed-in user's e-mail, if anyone is signed in. */
  signedInEmail: string | null;
}

/**
 * `POST /api/invitations/:token/accept`. Signed in as the invited e-mail: an empty body. No account
 * yet: `{ name, password }` creates it and signs in. Signed in as someone else → 403
 * `invitation-other-account`. Errors as for the preview; nothing changes on any error.
 */
export const acceptInvitationSchema = z.object({
  name: personNameSchema.optional(),
  password: newPasswordSchema.optional(),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

/** The new-account form on the invitation page (password twice). */
export const acceptInvitationFormSchema = z
  .object({ name: personNameSchema, password: newPasswordSchema, passwordAgain: z.string() })
  .refine((v) => v.password === v.passwordAgain, {
    path: ['passwordAgain'],
    message: 'The two passwords differ',
  });
export type AcceptInvitationFormInput = z.infer<typeof acceptInvitationFormSchema>;

export interface AcceptInvitationAnswer {
  sugarbushId: number;
  role: Role;
  me: MeResponse;
}
