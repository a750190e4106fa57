import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router';
import { invitationQueryOptions } from '@/features/auth/api/invitation';
import { AcceptInvitationForm } from '@/features/auth/components/accept-invitation-form';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { AuthLayout } from './auth-layout';

export function AcceptInvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useQuery(invitationQueryOptions(token));
  return (
    <AuthLayout title="Join your chapter">
      {invitation.isPending && <p aria-live="polite">Checking your invitation…</p>}
      {invitation.isError && (
        <div className="flex flex-col gap-4">
          <Notice tone="bad" title="This invitation cannot be used">
            {messageOf(invitation.error)} Ask your chapter lead to invite you again.
          </Notice>
          <Link to="/sign-in" className="inline-flex min-h-12 items-center underline underline-offset-4">
            Already have an account? Sign in
          </Link>
        </div>
      )}
      {invitation.isSuccess && <AcceptInvitationForm token={token} invitation={invitation.data} onAccepted={() => navigate('/', { replace: true })} />}
    </AuthLayout>
  );
}
