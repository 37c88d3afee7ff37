import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router';
import { tokenSchema } from '@shared/schemas/auth';
import { AuthCard } from '@/components/layouts/auth-card';
import { Notice } from '@/components/ui/notice';
import { paths, type SignInState } from '@/config/paths';
import { NewPasswordForm } from '@/features/auth/components/new-password-form';
import { meQueryKey } from '@/lib/query-client';

export default function ResetPasswordRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const back = (
    <Link to={paths.resetRequest.href()} className="text-accent-700 underline">
      Ask for a new link
    </Link>
  );
  if (!tokenSchema.safeParse(token).success) {
    return (
      <AuthCard title="Choose a new password" footer={back}>
        <Notice tone="error">
          This reset link is not valid. Copy the whole link from the e-mail, or ask for a new one.
        </Notice>
      </AuthCard>
    );
  }
  const done = async () => {
    // The server ends every session of the account, this browser's too if it was signed in to it.
    const state: SignInState = {
      notice: 'Password changed. Sign in with the new password.',
      signedOut: true,
    };
    await navigate(paths.signIn.href(), { replace: true, state });
    await queryClient.invalidateQueries({ queryKey: meQueryKey });
  };
  return (
    <AuthCard
      title="Choose a new password"
      intro="Every open session of the account ends when the password changes."
      footer={back}
    >
      <NewPasswordForm token={token} onDone={() => void done()} />
    </AuthCard>
  );
}
