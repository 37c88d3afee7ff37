import { Navigate, useLocation, useSearchParams } from 'react-router';
import { AuthCard } from '@/components/layouts/auth-card';
import { Notice } from '@/components/ui/notice';
import { safeRedirect, type SignInState } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useUser } from '@/lib/auth';

export default function SignInRoute() {
  const { data: me } = useUser();
  const [search] = useSearchParams();
  const state = useLocation().state as SignInState | null;
  if (me) return <Navigate to={safeRedirect(search.get('redirectTo'))} replace />;
  return (
    <AuthCard title="Sign in to Bellwether" intro="Your workbench for enzyme pH-profile studies.">
      {state?.notice && (
        <Notice tone="success" className="mb-4">
          {state.notice}
        </Notice>
      )}
      <SignInForm defaultEmail={state?.email} />
    </AuthCard>
  );
}
