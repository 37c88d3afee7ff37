import { useNavigate, useParams } from 'react-router';
import { tokenSchema } from '@shared/schemas/auth';
import { AuthCard } from '@/components/layouts/auth-card';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths, type SignInState } from '@/config/paths';
import { getInvitationQueryOptions, useInvitation } from '@/features/invitations/api/get-invitation';
import { AcceptInvitationForm } from '@/features/invitations/components/accept-invitation-form';
import { InvitationSummary } from '@/features/invitations/components/invitation-summary';
import { useSignOut, useUser } from '@/lib/auth';
import { warmCache } from '@/lib/query-client';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    tokenSchema.safeParse(params.token).success
      ? warmCache(() => queryClient.ensureQueryData(getInvitationQueryOptions(params.token!)))
      : Promise.resolve(null);

const invalidLink =
  'This invitation link is not valid. Copy the whole link from the e-mail, or ask the person who invited you for a new one.';

export default function InvitationRoute() {
  const { token = '' } = useParams();
  const valid = tokenSchema.safeParse(token).success;
  if (!valid) {
    return (
      <AuthCard title="Accept the invitation">
        <Notice tone="error">{invalidLink}</Notice>
      </AuthCard>
    );
  }
  return <ValidInvitation token={token} />;
}

function ValidInvitation({ token }: { token: string }) {
  const invitation = useInvitation(token);
  const { data: me } = useUser();
  const signOut = useSignOut();
  const navigate = useNavigate();

  const accepted = (email: string) => {
    const state: SignInState = { email, notice: 'Account created. Sign in with your new password.' };
    // Someone else signed in on this browser (an admin trying the link): sign them out first.
    if (me) signOut.mutate({ state });
    else void navigate(paths.signIn.href(), { replace: true, state });
  };

  if (invitation.isPending) return <Loading label="Reading the invitation…" />;
  if (invitation.isError) {
    return (
      <AuthCard title="Accept the invitation">
        <Notice tone="error">{invitation.error.message}</Notice>
      </AuthCard>
    );
  }
  return (
    <AuthCard
      title="Welcome to Bellwether"
      intro="You were invited to join. Check the details, then choose your name and password."
    >
      <InvitationSummary invitation={invitation.data} />
      {me && (
        <Notice tone="warning" className="mt-4">
          You are signed in as {me.name}. Creating this account signs you out on this browser.
        </Notice>
      )}
      <div className="mt-5">
        <AcceptInvitationForm token={token} email={invitation.data.email} onAccepted={accepted} />
      </div>
    </AuthCard>
  );
}
