import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { INVITATION_DAYS, type InvitationInput } from '@shared/schemas/invitation';
import { roles } from '@shared/schemas/enums';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { TextField } from '@/components/ui/text-field';
import { roleLabels } from '@/lib/auth';
import { applyServerErrors } from '@/lib/form-errors';
import { useUnitSystem } from '@/lib/units';
import { invitationInputSchema, useCreateInvitation } from '../api/create-invitation';
import { messageFor } from '../lib/messages';
import { plainIssues } from '../lib/plain-issues';

const fieldNames = ['email', 'role'] as const;

/** Invites someone by e-mail to a role; the mailed link works once, for a week. */
export function InviteForm({ sugarbushId }: { sugarbushId: number }) {
  const { unit } = useUnitSystem();
  const create = useCreateInvitation(sugarbushId);
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string>();
  const form = useForm<InvitationInput>({
    resolver: zodResolver(invitationInputSchema, { error: plainIssues(unit) }),
    defaultValues: { email: '', role: 'tapper' },
  });
  const {
    register,
    formState: { errors },
  } = form;

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setNotice(undefined);
    create.mutate(input, {
      onSuccess: (invitation) => {
        form.reset({ email: '', role: invitation.role });
        setNotice(
          `Invitation sent to ${invitation.email}. The link works once, for ${INVITATION_DAYS} days.`,
        );
      },
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, fieldNames, messageFor)),
    });
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label="Invite someone"
      className="flex flex-col gap-4"
    >
      <div className="flex flex-wrap items-start gap-3">
        <TextField
          label="E-mail"
          error={errors.email?.message}
          className="min-w-60 flex-[2]"
          {...register('email')}
          type="email"
          inputMode="email"
          autoComplete="off"
        />
        <Field label="Role" error={errors.role?.message} className="min-w-40 flex-1">
          {(control) => (
            <select {...control} {...register('role')} className={controlClass}>
              {roles.map((r) => (
                <option key={r} value={r}>
                  {roleLabels[r]}
                </option>
              ))}
            </select>
          )}
        </Field>
      </div>
      <FormFooter
        error={formError}
        pending={create.isPending}
        label="Send the invitation"
        notice={notice}
      />
    </form>
  );
}
