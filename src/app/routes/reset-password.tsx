import { useSearchParams } from 'react-router';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  // A new link is a new form: nothing typed for the old one carries over.
  return <ResetPasswordForm key={token} token={token} />;
}
