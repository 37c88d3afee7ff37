import { Navigate, useLocation, useNavigate, useSearchParams } from 'react-router';
import { AuthCard } from '@/components/layouts/auth-card';
import { Notice } from '@/components/ui/notice';
import { safeRedirect, type SignInState } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useUser } from '@/lib/auth';

export default function SignInRoute() {
  const { data: me } = useUser();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const state = useLocation().state as SignInState | null;
  const target = safeRedirect(search.get('redirectTo'));
  // Already signed in (an old bookmark): go on. Right after Sign out the user is still cached.
  if (me && !state?.signedOut) return <Navigate to={target} replace />;
  return (
    <AuthCard title="Sign in to Bellwether" intro="Your workbench for enzyme pH-profile studies.">
      {state?.notice && (
        <Notice tone="success" className="mb-4">
          {state.notice}
        </Notice>
      )}
      <SignInForm defaultEmail={state?.email} onSignedIn={() => void navigate(target, { replace: true })} />
    </AuthCard>
  );
}
