import { useEffect, useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { z } from 'zod';
import { acceptInviteBodySchema, PASSWORD_MIN_LENGTH, type AcceptInviteBody } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { ErrorNote } from '@/components/ui/panel';
import { useAcceptInvite, useInvitation } from '@/features/auth/api/accept-invite';
import { usePasswordRule, type PasswordCheck } from '@/features/auth/use-password-rule';
import { AuthCard } from './auth-card';

/**
 * The request's own schema plus what only this form asks: the password typed twice, and the shared
 * password rule (it needs the invitee's e-mail), said before anything is sent.
 */
function setPasswordSchema(email: string, rule: { readonly current: PasswordCheck | null }) {
  return acceptInviteBodySchema
    .extend({ repeat: z.string() })
    .superRefine((v, ctx) => {
      const problem = rule.current?.(v.password, email);
      if (problem) ctx.addIssue({ code: 'custom', path: ['password'], message: problem });
      if (v.repeat !== v.password) ctx.addIssue({ code: 'custom', path: ['repeat'], message: 'must be the same as the new password' });
    })
    .transform(({ token, password }): AcceptInviteBody => ({ token, password }));
}

function SetPasswordForm({ token, email, accept }: { token: string; email: string; accept: ReturnType<typeof useAcceptInvite> }) {
  const { rule, ready } = usePasswordRule();
  const schema = useMemo(() => setPasswordSchema(email, rule), [email, rule]);
  // Checked as it is typed: the rule speaks before the password is sent.
  const form = useSchemaForm(schema, { mode: 'onChange', defaultValues: { token, password: '', repeat: '' } });
  const { trigger, getFieldState } = form;
  useEffect(() => {
    if (ready && getFieldState('password').isDirty) void trigger('password');
  }, [ready, trigger, getFieldState]);
  const passwordRefused = form.formState.errors.password !== undefined;
  return (
    <Form
      form={form}
      onSubmit={(body) => accept.mutate(body)}
      serverError={accept.error}
      className="flex flex-col gap-4"
      aria-label="Set your password"
    >
      <Field
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        required
        hint={`At least ${PASSWORD_MIN_LENGTH} characters, not your e-mail, not a common password.`}
      />
      <Field name="repeat" label="Repeat password" type="password" autoComplete="new-password" required />
      <Button type="submit" disabled={accept.isPending || passwordRefused}>
        Set password
      </Button>
    </Form>
  );
}

export function AcceptInvitePage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const invitation = useInvitation(token);
  const accept = useAcceptInvite();

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
        <div className="flex flex-col gap-4">
          <p className="text-sm text-ink-soft">
            Welcome, {invitation.data.invitation.name} ({invitation.data.invitation.email}).
          </p>
          <SetPasswordForm token={token} email={invitation.data.invitation.email} accept={accept} />
        </div>
      )}
    </AuthCard>
  );
}
