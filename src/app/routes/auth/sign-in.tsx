import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { useMe } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { AuthCard } from './auth-card';

/** Only same-app paths are followed after sign-in, never another site. */
function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/counter';
}

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNext(params.get('next'));
  if (me.data) return <Navigate to={next} replace />;
  return (
    <AuthCard title="Sign in to the ignition desk">
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </AuthCard>
  );
}
