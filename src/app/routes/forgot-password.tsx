import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return <ForgotPasswordForm />;
}
