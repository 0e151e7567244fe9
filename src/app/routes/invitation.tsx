import { useQueryClient } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router';
import { paths } from '@/config/paths';
import { useLogout } from '@/features/auth/api/logout';
import { InvitationView } from '@/features/invitations/components/invitation-view';

export function InvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const logout = useLogout();

  return (
    <InvitationView
      token={token}
      onJoined={(answer) => navigate(paths.trees.href(answer.sugarbushId), { replace: true })}
      // Signed out, the page reads the invitation again and offers the invited address's way in.
      onSignOut={() =>
        logout.mutate(undefined, { onSettled: () => void queryClient.resetQueries() })
      }
      signingOut={logout.isPending}
    />
  );
}
