import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  acceptInvitationFormSchema,
  type AcceptInvitationAnswer,
} from '@shared/schemas/invitation';
import { FormSubmit } from '@/components/ui/form-submit';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';
import { acceptErrorMessage } from './accept-error';

/** No account with the invited address yet: a name and a password make it, and join. */
export function JoinWithNewAccount({
  token,
  email,
  onJoined,
}: {
  token: string;
  email: string;
  onJoined: (answer: AcceptInvitationAnswer) => void;
}) {
  const form = useForm({
    resolver: zodResolver(acceptInvitationFormSchema),
    defaultValues: { name: '', password: '', passwordAgain: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const accept = useAcceptInvitation(token);

  const onSubmit = form.handleSubmit(({ name, password }) => {
    setFormError(null);
    accept.mutate(
      { name, password },
      {
        onSuccess: onJoined,
        onError: (error) =>
          setFormError(
            applyServerErrors(error, form.setError, ['name', 'password'], acceptErrorMessage),
          ),
      },
    );
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label="Make your account"
      className="flex flex-col gap-4"
    >
      <div>
        <h2 className="text-lg font-bold">Make your account</h2>
        <p className="mt-1 text-bark">You will sign in with {email}.</p>
      </div>
      <TextField
        label="Your name"
        error={errors.name?.message}
        {...form.register('name')}
        type="text"
        autoComplete="name"
      />
      <TextField
        label="Password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
        type="password"
        autoComplete="new-password"
      />
      <TextField
        label="Password again"
        error={errors.passwordAgain?.message}
        {...form.register('passwordAgain')}
        type="password"
        autoComplete="new-password"
      />
      <FormSubmit error={formError} pending={accept.isPending} label="Create account and join" />
    </form>
  );
}
