import { Link, useNavigate, useParams } from 'react-router';
import { tokenSchema } from '@shared/schemas/auth';
import { AuthCard } from '@/components/layouts/auth-card';
import { Notice } from '@/components/ui/notice';
import { paths, type SignInState } from '@/config/paths';
import { NewPasswordForm } from '@/features/auth/components/new-password-form';

export default function ResetPasswordRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
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
  const done = () => {
    const state: SignInState = { notice: 'Password changed. Sign in with the new password.' };
    void navigate(paths.signIn.href(), { replace: true, state });
  };
  return (
    <AuthCard
      title="Choose a new password"
      intro="Your other open sessions end when the password changes."
      footer={back}
    >
      <NewPasswordForm token={token} onDone={done} />
    </AuthCard>
  );
}
