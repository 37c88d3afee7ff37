import { Link } from 'react-router';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';

export default function ResetPasswordRequestRoute() {
  return (
    <AuthCard
      title="Reset your password"
      intro="Enter the e-mail address of your account. We send a link to choose a new password; it works once, within one hour."
      footer={
        <Link to={paths.signIn.href()} className="text-accent-700 underline">
          Back to sign in
        </Link>
      }
    >
      <ResetRequestForm />
    </AuthCard>
  );
}
