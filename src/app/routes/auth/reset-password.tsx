import { Link, useParams } from 'react-router';
import { ResetConfirmForm } from '@/features/auth/components/reset-confirm-form';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';
import { AuthLayout } from './auth-layout';

export function ResetPasswordRequestRoute() {
  return (
    <AuthLayout title="Reset your password">
      <p className="mb-4">Enter the e-mail of your account. If it belongs to an active account we send a link that works for 1 hour.</p>
      <ResetRequestForm />
      <Link to="/sign-in" className="mt-4 inline-flex min-h-12 items-center underline underline-offset-4">
        Back to sign in
      </Link>
    </AuthLayout>
  );
}

export function ResetPasswordConfirmRoute() {
  const { token = '' } = useParams();
  return (
    <AuthLayout title="Choose a new password">
      <ResetConfirmForm token={token} />
    </AuthLayout>
  );
}
