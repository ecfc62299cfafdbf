import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { PASSWORD_MIN_LENGTH } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useAcceptInvite, useInvitation } from '@/features/auth/api/accept-invite';
import { usePasswordProblem } from '@/features/auth/use-password-problem';
import { AuthCard } from './auth-card';

export function AcceptInvitePage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const invitation = useInvitation(token);
  const accept = useAcceptInvite();
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const mismatch = repeat.length > 0 && repeat !== password;
  const problem = usePasswordProblem(password, invitation.data?.invitation.email ?? '');

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!mismatch && !problem) accept.mutate({ token, password });
  };

  if (accept.isSuccess) {
    return (
      <AuthCard title="Password set">
        <p className="mb-4 text-ink-soft">Your account is ready. Sign in with your e-mail and the new password.</p>
        <Link to="/sign-in" className="font-medium text-accent underline">
          Go to sign-in
        </Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Set your password">
      {invitation.isError && <ErrorNote error={invitation.error} />}
      {invitation.data && (
        <form onSubmit={submit} className="flex flex-col gap-4">
          <p className="text-sm text-ink-soft">
            Welcome, {invitation.data.invitation.name} ({invitation.data.invitation.email}).
          </p>
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            required
            minLength={PASSWORD_MIN_LENGTH}
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            hint={`At least ${PASSWORD_MIN_LENGTH} characters, not your e-mail, not a common password.`}
            error={problem ? `The password ${problem}.` : undefined}
          />
          <TextField
            label="Repeat password"
            type="password"
            autoComplete="new-password"
            required
            value={repeat}
            onChange={(e) => setRepeat(e.target.value)}
            error={mismatch ? 'The two passwords differ.' : undefined}
          />
          <ErrorNote error={accept.error} />
          <Button type="submit" disabled={accept.isPending || mismatch || problem !== null}>
            Set password
          </Button>
        </form>
      )}
    </AuthCard>
  );
}
